import type { Db, DbOrTx } from '@/db/client';
import { CAUTION_TEXT } from '@/lib/calc';
import type { SentMemberBudget } from '@/lib/budget';
import { notFound, AppError } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import { findMember, listMembers } from '@/server/api/members/members.repository';
import { designsOfJob } from '@/server/api/requests/member-designs';
import { isStale, staleAfterDays } from '@/server/api/price-book/price-book.service';
import { runInPool, runTask } from '@/server/services/calc-pool';
import type {
  JobBudget,
  MemberBudgetSave,
  MemberBudgetView,
  SendBudget,
  SentBudget,
  SentBudgetSnapshot,
} from '@/shared/schemas/budgets';
import type { Job } from '@/shared/schemas/jobs';
import { budgetLinesCsv } from './budget-csv';
import {
  findMemberBudget,
  findSentBudget,
  insertSentBudget,
  listSentBudgets,
  priceAmounts,
  saveMemberBudget,
} from './budgets.repository';
import type { PriceBookState } from './member-budget-view';

const DEFAULT_EXCLUSIONS = [
  'Hidden conditions found once the wall is open, beyond the allowances named',
  'Changes the engineer’s design makes beyond the range',
];

function priceBook(db: DbOrTx, orgId: string): PriceBookState {
  const { amounts, setAt } = priceAmounts(db, orgId);
  const days = staleAfterDays(db, orgId);
  const now = Date.now();
  return {
    amounts,
    stale: new Set([...setAt].filter(([, at]) => isStale(at, days, now)).map(([key]) => key)),
  };
}

/** The scope in words, from what the budgets hold. */
function scopeText(job: Job, views: readonly MemberBudgetView[]): string {
  const parts = views.map((v) => {
    const groups = new Set(v.lines.map((l) => l.group));
    const work = [
      `${v.memberLabel}: a new member (${v.design ? `${v.design.label}, the engineer’s design` : `${v.sizeLabel}, preliminary`})`,
      groups.has('shoring') ? 'temporary shoring' : null,
      groups.has('posts-and-footing') ? 'posts and footings' : null,
      groups.has('hardware') ? 'hangers and fastening' : null,
      groups.has('finishes')
        ? 'the finish patch (drywall, texture, paint, flooring along the old wall line)'
        : null,
    ].filter(Boolean);
    return work.join(', ');
  });
  return `Structural work at ${job.name}. ${parts.join('. ')}. Permit and the engineer’s design included.`;
}

/**
 * Budgets of the firm's members and jobs, computed on every read from the member's stored check, the
 * estimator's choices and the firm's price book; a budget sent to a client is a frozen, dated copy.
 */
export function createBudgetsService(db: Db) {
  const jobOf = (orgId: string, jobId: string) => {
    const job = findJob(db, orgId, jobId);
    if (!job) throw notFound('Job');
    return job;
  };
  /** Each member's part of the latest budget sent to the client that holds it (sent budgets newest first). */
  const sentParts = (orgId: string, jobId: string): Map<string, SentMemberBudget> => {
    const parts = new Map<string, SentMemberBudget>();
    for (const sent of listSentBudgets(db, orgId, jobId)) {
      for (const m of sent.snapshot.members) {
        if (!m.memberId || !m.shape || parts.has(m.memberId)) continue;
        parts.set(m.memberId, {
          id: sent.id,
          clientName: sent.clientName,
          sentAt: sent.sentAt,
          shape: m.shape,
          lowCents: m.lowCents,
          highCents: m.highCents,
        });
      }
    }
    return parts;
  };
  // What a budget is priced from is read here; the pricing (a shortlist, a check per scenario) runs in the
  // calculation pool.
  const view = async (orgId: string, memberId: string): Promise<MemberBudgetView> => {
    const member = findMember(db, orgId, memberId);
    if (!member) throw notFound('Member');
    const job = jobOf(orgId, member.jobId);
    const design = designsOfJob(db, orgId, member.jobId).find((d) => d.memberId === memberId);
    const saved = findMemberBudget(db, orgId, memberId);
    const sent = sentParts(orgId, member.jobId).get(memberId);
    const [only] = await runInPool('budgetViews', [
      { member, job, saved, book: priceBook(db, orgId), design, sent },
    ]);
    return only;
  };
  const jobViews = async (orgId: string, jobId: string) => {
    const job = jobOf(orgId, jobId);
    const book = priceBook(db, orgId);
    const designs = designsOfJob(db, orgId, jobId);
    const sent = sentParts(orgId, jobId);
    const facts = listMembers(db, orgId, jobId).map((item) => {
      const member = findMember(db, orgId, item.id);
      if (!member) throw notFound('Member');
      const design = designs.find((d) => d.memberId === item.id);
      return {
        member,
        job,
        saved: findMemberBudget(db, orgId, item.id),
        book,
        design,
        sent: sent.get(item.id),
      };
    });
    return { job, views: await runInPool('budgetViews', facts) };
  };

  return {
    member: view,

    save(actor: Actor, memberId: string, body: MemberBudgetSave): Promise<MemberBudgetView> {
      db.transaction((tx) => {
        const member = findMember(tx, actor.orgId, memberId);
        if (!member) throw notFound('Member');
        saveMemberBudget(tx, { ...actor, memberId }, body);
        recordAudit(tx, actor, {
          action: 'budget.save',
          subject: memberId,
          detail: { jobId: member.jobId, overrides: Object.keys(body.overrides) },
        });
      });
      return view(actor.orgId, memberId);
    },

    async memberCsv(orgId: string, memberId: string): Promise<string> {
      const v = await view(orgId, memberId);
      return budgetLinesCsv([{ label: v.memberLabel, lines: v.lines }]);
    },

    async job(orgId: string, jobId: string): Promise<JobBudget> {
      const { job, views } = await jobViews(orgId, jobId);
      return {
        jobId,
        jobName: job.name,
        caution: CAUTION_TEXT,
        members: views.map((v) => ({
          memberId: v.memberId,
          label: v.memberLabel,
          sizeLabel: v.sizeLabel,
          totalCents: v.totalCents,
          range: v.range,
          missingPrices: v.missingPrices.length,
          design: v.design,
          changeOrder: v.changeOrder,
        })),
        lowCents: views.reduce((sum, v) => sum + v.range.lowCents, 0),
        highCents: views.reduce((sum, v) => sum + v.range.highCents, 0),
        changeOrders: views.filter((v) => v.changeOrder).length,
        sent: listSentBudgets(db, orgId, jobId).map((s) => ({
          id: s.id,
          clientName: s.clientName,
          sentAt: s.sentAt,
          lowCents: s.snapshot.lowCents,
          highCents: s.snapshot.highCents,
        })),
      };
    },

    async jobCsv(orgId: string, jobId: string): Promise<string> {
      const { views } = await jobViews(orgId, jobId);
      return budgetLinesCsv(views.map((v) => ({ label: v.memberLabel, lines: v.lines })));
    },

    async send(actor: Actor, jobId: string, body: SendBudget): Promise<SentBudget> {
      const { job, views } = await jobViews(actor.orgId, jobId);
      const missing = views.filter((v) => v.missingPrices.length > 0).map((v) => v.memberLabel);
      if (missing.length > 0)
        throw new AppError(
          'conflict',
          `Price every line first: ${missing.join(', ')} still miss prices in the price book`,
        );
      const snapshot: SentBudgetSnapshot = {
        jobName: job.name,
        jobAddress: job.address,
        clientName: body.clientName,
        scope: body.scope || scopeText(job, views),
        exclusions: body.exclusions.length ? body.exclusions : DEFAULT_EXCLUSIONS,
        allowances: [
          ...new Set(
            views.flatMap((v) => v.lines.filter((l) => l.client === 'allowance').map((l) => l.label)),
          ),
        ],
        caution: CAUTION_TEXT,
        lowCents: views.reduce((sum, v) => sum + v.range.lowCents, 0),
        highCents: views.reduce((sum, v) => sum + v.range.highCents, 0),
        members: views.map((v) => ({
          memberId: v.memberId,
          shape: v.pricedShape,
          label: v.memberLabel,
          lowLabel: v.range.lowLabel,
          highLabel: v.range.highLabel,
          lowCents: v.range.lowCents,
          highCents: v.range.highCents,
          lines: v.lines,
        })),
      };
      return db.transaction((tx) => {
        const sent = insertSentBudget(
          tx,
          { orgId: actor.orgId, jobId, userId: actor.userId },
          body.clientName,
          snapshot,
        );
        recordAudit(tx, actor, {
          action: 'budget.send',
          subject: sent.id,
          detail: { jobId, low: snapshot.lowCents, high: snapshot.highCents },
        });
        return sent;
      });
    },

    sent(orgId: string, budgetId: string): SentBudget {
      const sent = findSentBudget(db, orgId, budgetId);
      if (!sent) throw notFound('Budget');
      return sent;
    },

    sentCsv(orgId: string, budgetId: string): string {
      const sent = findSentBudget(db, orgId, budgetId);
      if (!sent) throw notFound('Budget');
      return budgetLinesCsv(sent.snapshot.members);
    },

    async sentPdf(orgId: string, budgetId: string): Promise<Uint8Array> {
      const sent = findSentBudget(db, orgId, budgetId);
      if (!sent) throw notFound('Budget');
      // Building the PDF (fonts embedded whole) would hold the event loop: it runs in the pool.
      return runTask('budgetSummaryPdf', sent);
    },
  };
}

export type BudgetsService = ReturnType<typeof createBudgetsService>;
