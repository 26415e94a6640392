import { Router } from 'express';
import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import type { RateLimitOptions } from '@/server/middleware/auth-limits';
import type { Mailer } from '@/server/services/mail/mailer';
import type { Sessions } from '@/server/services/sessions';
import { authRouter } from './auth/auth.router';
import { createAuthService } from './auth/auth.service';
import { calcRouter } from './calc/calc.router';
import { createCalcService } from './calc/calc.service';
import { devMailRouter } from './dev-mail/dev-mail.router';
import { healthRouter } from './health/health.router';
import { invitationsRouter } from './invitations/invitations.router';
import { createInvitationsService } from './invitations/invitations.service';
import { jobsRouter } from './jobs/jobs.router';
import { createJobsService } from './jobs/jobs.service';
import { meRouter } from './me/me.router';
import { jobMembersRouter, membersRouter } from './members/members.router';
import { createMembersService } from './members/members.service';
import { createMeService } from './me/me.service';
import { orgsRouter } from './orgs/orgs.router';
import { createOrgsService } from './orgs/orgs.service';
import {
  jobBudgetRouter,
  jobSentBudgetsRouter,
  memberBudgetRouter,
  sentBudgetsRouter,
} from './budgets/budgets.router';
import { createBudgetsService } from './budgets/budgets.service';
import { priceBookRouter } from './price-book/price-book.router';
import { createPriceBookService } from './price-book/price-book.service';

export interface ApiOptions {
  db: Db;
  mailer: Mailer;
  sessions: Sessions;
  appOrigin: string;
  signInLimit: RateLimitOptions;
  signUpLimit: RateLimitOptions;
  /** Key of GET /api/dev/mail; the route is mounted only when there is one. */
  devMailKey?: string;
}

/** Everything under /api; unknown paths end in a JSON 404. */
export function apiRouter(options: ApiOptions): Router {
  const { db, sessions } = options;
  const me = createMeService(db);
  const router = Router();
  router.use('/health', healthRouter());
  router.use(
    '/auth',
    authRouter({
      db,
      auth: createAuthService(options),
      me,
      sessions,
      signInLimit: options.signInLimit,
      signUpLimit: options.signUpLimit,
    }),
  );
  router.use('/me', meRouter({ me }));
  router.use('/orgs', orgsRouter({ db, orgs: createOrgsService(options) }));
  router.use('/invitations', invitationsRouter({ invitations: createInvitationsService(db), me, sessions }));
  const budgets = { db, budgets: createBudgetsService(db) };
  router.use('/price-book', priceBookRouter({ db, priceBook: createPriceBookService(db) }));
  router.use('/members/:memberId/budget', memberBudgetRouter(budgets));
  router.use('/jobs/:jobId/budget', jobBudgetRouter(budgets));
  router.use('/jobs/:jobId/budgets', jobSentBudgetsRouter(budgets));
  router.use('/budgets', sentBudgetsRouter(budgets));
  const members = { db, members: createMembersService(db) };
  router.use('/jobs/:jobId/members', jobMembersRouter(members));
  router.use('/members', membersRouter(members));
  router.use('/jobs', jobsRouter({ db, jobs: createJobsService(db) }));
  router.use('/calc', calcRouter({ calc: createCalcService() }));
  if (options.devMailKey) router.use('/dev/mail', devMailRouter({ db, key: options.devMailKey }));
  router.use(() => {
    throw new AppError('not_found', 'No such API route');
  });
  return router;
}
