import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import {
  priceBookSettingsSchema,
  priceImportSchema,
  pricePatchSchema,
  priceSetSchema,
} from '@/shared/schemas/price-book';
import type { PriceBookService } from './price-book.service';

const itemParams = z.object({ itemId: z.string().min(1).max(100) });
const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

/** Who may change prices: the owner and the estimator. Contractors read; engineers never see the book. */
const writer = requireRole('owner', 'estimator');

/** `/api/price-book`: the firm's prices, their CSV, and one-at-a-time or whole-file changes. */
export function priceBookRouter(deps: { db: Db; priceBook: PriceBookService }): Router {
  const router = Router();
  router.use(requireMember(deps.db), requireRole('owner', 'estimator', 'contractor'));

  router.get('/', (_req, res) => {
    res.json(deps.priceBook.read(res.locals.member.orgId));
  });

  router.get('/export.csv', (_req, res) => {
    res
      .type('text/csv; charset=utf-8')
      .attachment('price-book.csv')
      .send(deps.priceBook.csv(res.locals.member.orgId));
  });

  router.patch('/settings', writer, validate({ body: priceBookSettingsSchema }), (req, res) => {
    res.json(deps.priceBook.setStaleAfterDays(actorOf(res), req.body.staleAfterDays));
  });

  router.post('/items', writer, validate({ body: priceSetSchema }), (req, res) => {
    res.status(201).json(deps.priceBook.set(actorOf(res), req.body));
  });

  router.patch(
    '/items/:itemId',
    writer,
    validate({ params: itemParams, body: pricePatchSchema }),
    (req, res) => {
      res.json(deps.priceBook.update(actorOf(res), req.params.itemId, req.body));
    },
  );

  router.delete('/items/:itemId', writer, validate({ params: itemParams }), (req, res) => {
    deps.priceBook.remove(actorOf(res), req.params.itemId);
    res.status(204).end();
  });

  router.post('/import', writer, validate({ body: priceImportSchema }), (req, res) => {
    res.json(deps.priceBook.importCsv(actorOf(res), req.body));
  });

  return router;
}
