import { Router } from 'express';
import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import type { RateLimitOptions } from '@/server/middleware/auth-limits';
import type { Mailer } from '@/server/services/mail/mailer';
import type { Sessions } from '@/server/services/sessions';
import type { FileStorage } from '@/server/services/storage/file-storage';
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
import { createAnswerCache } from '@/server/services/answer-cache';
import {
  elementsRouter,
  jobElementsRouter,
  jobLoadPathRouter,
  memberEndsRouter,
} from './load-path/load-path.router';
import { createLoadPathService } from './load-path/load-path.service';
import { meRouter } from './me/me.router';
import { jobMembersRouter, membersRouter } from './members/members.router';
import { createMembersService } from './members/members.service';
import { createMeService } from './me/me.service';
import { orgsRouter } from './orgs/orgs.router';
import { jobChecklistRouter, jobProgressRouter } from './checklist/checklist.router';
import { createChecklistService } from './checklist/checklist.service';
import { jobScreensRouter, screensRouter } from './screens/screens.router';
import { createScreensService } from './screens/screens.service';
import { memberShoringRouter } from './shoring/shoring.router';
import { createShoringService } from './shoring/shoring.service';
import { createOrgsService } from './orgs/orgs.service';
import { requestInvitationsRouter } from './requests/request-invitations.router';
import { createRequestInvitationsService } from './requests/request-invitations.service';
import { attachmentsRouter } from './requests/attachments.router';
import { createAttachmentsService } from './requests/attachments.service';
import { packageRouter } from './requests/package.router';
import { createPackageService } from './requests/package.service';
import { jobDesignsRouter, jobRequestsRouter, requestsRouter } from './requests/requests.router';
import { createRequestsService } from './requests/requests.service';
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
  storage: FileStorage;
  sessions: Sessions;
  appOrigin: string;
  signInLimit: RateLimitOptions;
  signUpLimit: RateLimitOptions;
  /** Key of GET /api/dev/mail; the route is mounted only when there is one. */
  devMailKey?: string;
}

/**
 * Everything under /api; unknown paths end in a JSON 404. The routers are grouped by the path's first part
 * (`/jobs`, `/members`, `/requests`): a request is matched against the few mounts of its own group, not
 * against every mount in turn (the order inside a group is the order they must be tried in).
 */
export function apiRouter(options: ApiOptions): Router {
  const { db, sessions } = options;
  const me = createMeService(db);
  const budgets = { db, budgets: createBudgetsService(db) };
  // The most read answers (a firm's jobs, a job, its members), kept until the database changes.
  const answers = createAnswerCache(db);
  const members = { db, members: createMembersService(db), answers };
  const screens = { db, screens: createScreensService(db) };
  const checklist = { db, checklist: createChecklistService(db) };
  const loadPath = { db, loadPath: createLoadPathService(db) };
  const requests = { db, requests: createRequestsService(options) };

  const jobs = Router();
  jobs.use('/:jobId/budget', jobBudgetRouter(budgets));
  jobs.use('/:jobId/budgets', jobSentBudgetsRouter(budgets));
  jobs.use('/:jobId/members', jobMembersRouter(members));
  jobs.use('/:jobId/screens', jobScreensRouter(screens));
  jobs.use('/:jobId/checklist', jobChecklistRouter(checklist));
  jobs.use('/:jobId/load-path', jobLoadPathRouter(loadPath));
  jobs.use('/:jobId/elements', jobElementsRouter(loadPath));
  jobs.use('/:jobId/requests', jobRequestsRouter(requests));
  jobs.use('/:jobId/designs', jobDesignsRouter(db));
  jobs.use(jobsRouter({ db, jobs: createJobsService(db), answers }));

  const memberRoutes = Router();
  memberRoutes.use('/:memberId/budget', memberBudgetRouter(budgets));
  memberRoutes.use('/:memberId/shoring', memberShoringRouter({ db, shoring: createShoringService(db) }));
  memberRoutes.use('/:memberId/ends', memberEndsRouter(loadPath));
  memberRoutes.use(membersRouter(members));

  const requestRoutes = Router();
  requestRoutes.use(
    '/:requestId/attachments',
    attachmentsRouter({ db, attachments: createAttachmentsService({ db, storage: options.storage }) }),
  );
  requestRoutes.use(
    '/:requestId',
    packageRouter({ db, packages: createPackageService({ db, storage: options.storage }) }),
  );
  requestRoutes.use(requestsRouter(requests));

  const router = Router();
  router.use('/health', healthRouter());
  router.use('/jobs', jobs);
  router.use('/members', memberRoutes);
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
  router.use('/price-book', priceBookRouter({ db, priceBook: createPriceBookService(db) }));
  router.use('/budgets', sentBudgetsRouter(budgets));
  router.use('/screens', screensRouter(screens));
  router.use('/job-progress', jobProgressRouter(checklist));
  router.use('/elements', elementsRouter(loadPath));
  router.use('/requests', requestRoutes);
  router.use(
    '/request-invitations',
    requestInvitationsRouter({ invitations: createRequestInvitationsService(db), me, sessions }),
  );
  router.use('/calc', calcRouter({ calc: createCalcService() }));
  if (options.devMailKey) router.use('/dev/mail', devMailRouter({ db, key: options.devMailKey }));
  router.use(() => {
    throw new AppError('not_found', 'No such API route');
  });
  return router;
}
