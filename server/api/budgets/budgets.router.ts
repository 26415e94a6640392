import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { requireMember, requireRole, signedInUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { memberBudgetSaveSchema, sendBudgetSchema } from '@/shared/schemas/budgets';
import type { BudgetsService } from './budgets.service';

const memberParams = z.object({ memberId: z.string().min(1).max(100) });
const jobParams = z.object({ jobId: z.string().min(1).max(100) });
const budgetParams = z.object({ budgetId: z.string().min(1).max(100) });
const actorOf = (res: Response) => ({ userId: signedInUser(res).id, orgId: res.locals.member.orgId });

interface BudgetsDeps {
  db: Db;
  budgets: BudgetsService;
}

/** Contractors read budgets; the owner and the estimator write them; engineers never see them. */
function readers(db: Db, options: { mergeParams: boolean }): Router {
  const router = Router(options);
  router.use(requireMember(db), requireRole('owner', 'estimator', 'contractor'));
  return router;
}
const writer = requireRole('owner', 'estimator');

/** `/api/members/:memberId/budget`: one member's budget (read, save choices and overrides, CSV). */
export function memberBudgetRouter(deps: BudgetsDeps): Router {
  const router = readers(deps.db, { mergeParams: true });
  router.get('/', validate({ params: memberParams }), async (req, res) => {
    res.json(await deps.budgets.member(res.locals.member.orgId, req.params.memberId));
  });
  router.put(
    '/',
    writer,
    validate({ params: memberParams, body: memberBudgetSaveSchema }),
    async (req, res) => {
      res.json(await deps.budgets.save(actorOf(res), req.params.memberId, req.body));
    },
  );
  router.get('/lines.csv', validate({ params: memberParams }), async (req, res) => {
    res
      .type('text/csv; charset=utf-8')
      .attachment('member-budget.csv')
      .send(await deps.budgets.memberCsv(res.locals.member.orgId, req.params.memberId));
  });
  return router;
}

/** `/api/jobs/:jobId/budget`: the job's members summed, and their lines as CSV. */
export function jobBudgetRouter(deps: BudgetsDeps): Router {
  const router = readers(deps.db, { mergeParams: true });
  router.get('/', validate({ params: jobParams }), async (req, res) => {
    res.json(await deps.budgets.job(res.locals.member.orgId, req.params.jobId));
  });
  router.get('/lines.csv', validate({ params: jobParams }), async (req, res) => {
    res
      .type('text/csv; charset=utf-8')
      .attachment('job-budget.csv')
      .send(await deps.budgets.jobCsv(res.locals.member.orgId, req.params.jobId));
  });
  return router;
}

/** `/api/jobs/:jobId/budgets`: send the job budget to a client (frozen and dated). */
export function jobSentBudgetsRouter(deps: BudgetsDeps): Router {
  const router = readers(deps.db, { mergeParams: true });
  router.post('/', writer, validate({ params: jobParams, body: sendBudgetSchema }), async (req, res) => {
    res.status(201).json(await deps.budgets.send(actorOf(res), req.params.jobId, req.body));
  });
  return router;
}

/** `/api/budgets/:budgetId`: a sent budget, its lines as CSV and its client summary PDF. */
export function sentBudgetsRouter(deps: BudgetsDeps): Router {
  const router = readers(deps.db, { mergeParams: false });
  router.get('/:budgetId', validate({ params: budgetParams }), (req, res) => {
    res.json(deps.budgets.sent(res.locals.member.orgId, req.params.budgetId));
  });
  router.get('/:budgetId/lines.csv', validate({ params: budgetParams }), (req, res) => {
    res
      .type('text/csv; charset=utf-8')
      .attachment('sent-budget.csv')
      .send(deps.budgets.sentCsv(res.locals.member.orgId, req.params.budgetId));
  });
  router.get('/:budgetId/summary.pdf', validate({ params: budgetParams }), async (req, res) => {
    const pdf = await deps.budgets.sentPdf(res.locals.member.orgId, req.params.budgetId);
    res.type('application/pdf').attachment('budget-summary.pdf').send(Buffer.from(pdf));
  });
  return router;
}
