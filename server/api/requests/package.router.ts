import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import type { PackageService } from './package.service';
import { viewerOf } from './requests.router';

const requestParams = z.object({ requestId: z.string().min(1).max(100) });

const attachment = (name: string) => `attachment; filename="${name}"`;

/** `/api/requests/:requestId/package.pdf`, `package.json`, `loads.csv` and `photos.zip`. */
export function packageRouter(deps: { db: Db; packages: PackageService }): Router {
  const router = Router({ mergeParams: true });
  router.use(requireMember(deps.db));

  router.get('/package.pdf', validate({ params: requestParams }), async (req, res) => {
    const { bytes, fileName } = await deps.packages.pdf(viewerOf(res), req.params.requestId);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', attachment(fileName));
    res.send(Buffer.from(bytes));
  });

  router.get('/package.json', validate({ params: requestParams }), (req, res) => {
    const pkg = deps.packages.json(viewerOf(res), req.params.requestId);
    res.setHeader(
      'Content-Disposition',
      attachment(`design-request-${pkg.request.number}-v${pkg.request.version}.json`),
    );
    res.json(pkg);
  });

  router.get('/loads.csv', validate({ params: requestParams }), (req, res) => {
    const { text, fileName } = deps.packages.csv(viewerOf(res), req.params.requestId);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', attachment(fileName));
    res.send(text);
  });

  router.get('/photos.zip', validate({ params: requestParams }), async (req, res) => {
    const zip = deps.packages.photosZip(viewerOf(res), req.params.requestId);
    res.setHeader('Content-Type', 'application/zip');
    res.setHeader('Content-Disposition', attachment(zip.fileName));
    await zip.write(res);
  });

  return router;
}
