import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { REPLAYED_HEADER } from '@/server/middleware/idempotency';
import { validate } from '@/server/middleware/validate';
import { shoringPlanPutSchema } from '@/shared/schemas/shoring-plans';
import type { ShoringService } from './shoring.service';

const memberParams = z.object({ memberId: z.string().min(1).max(100) });

/** `/api/members/:memberId/shoring`: the member's temporary shoring plan (read, save). Firm roles only. */
export function memberShoringRouter(deps: { db: Db; shoring: ShoringService }): Router {
  const router = Router({ mergeParams: true });
  router.use(requireMember(deps.db), requireRole('owner', 'contractor', 'estimator'));

  router.get('/', validate({ params: memberParams }), (req, res) => {
    res.json(deps.shoring.get(res.locals.member.orgId, req.params.memberId));
  });

  router.put('/', validate({ params: memberParams, body: shoringPlanPutSchema }), (req, res) => {
    const actor = { userId: signedInUser(res).id, orgId: res.locals.member.orgId };
    const saved = deps.shoring.save(actor, req.params.memberId, req.body);
    // A PUT answers 200 whether it made the plan or changed it; a first save sent again says so.
    if (saved.replayed) res.setHeader(REPLAYED_HEADER, 'true');
    res.json(saved.record);
  });

  return router;
}
