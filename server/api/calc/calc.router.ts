import { Router } from 'express';
import { requireUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { memberCheckRequestSchema } from '@/shared/schemas/calc/requests';
import { shortlistInputSchema } from '@/shared/schemas/calc/shortlist';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';
import type { CalcService } from './calc.service';

/** Stateless calculations for any signed-in user, whatever the firm or role: the client's own engine. */
export function calcRouter(deps: { calc: CalcService }): Router {
  const router = Router();
  router.use(requireUser);

  router.post('/check', validate({ body: memberCheckRequestSchema }), (req, res) => {
    res.json(deps.calc.check(req.body));
  });

  router.post('/shortlist', validate({ body: shortlistInputSchema }), async (req, res) => {
    res.type('json').send(await deps.calc.shortlist(req.body));
  });

  router.post('/span-table', validate({ body: spanTableInputSchema }), async (req, res) => {
    res.type('json').send(await deps.calc.spanTable(req.body));
  });

  return router;
}
