import {
  jobBudgetSchema,
  memberBudgetViewSchema,
  sentBudgetSchema,
  type MemberBudgetSaveBody,
  type SendBudgetBody,
} from '@/shared/schemas/budgets';
import { apiRequest } from './client';

/** Budgets: a member's (read, save choices and overrides), a job's, and budgets sent to a client. */

const memberBudgetPath = (memberId: string) => `/api/members/${encodeURIComponent(memberId)}/budget`;
const jobPath = (jobId: string) => `/api/jobs/${encodeURIComponent(jobId)}`;

export const fetchMemberBudget = (memberId: string) =>
  apiRequest('GET', memberBudgetPath(memberId), memberBudgetViewSchema);

export const saveMemberBudget = (memberId: string, body: MemberBudgetSaveBody) =>
  apiRequest('PUT', memberBudgetPath(memberId), memberBudgetViewSchema, body);

export const fetchJobBudget = (jobId: string) =>
  apiRequest('GET', `${jobPath(jobId)}/budget`, jobBudgetSchema);

export const sendJobBudget = (jobId: string, body: SendBudgetBody) =>
  apiRequest('POST', `${jobPath(jobId)}/budgets`, sentBudgetSchema, body);

/** Where the browser downloads the CSV of a job's lines. */
export const jobBudgetCsvPath = (jobId: string) => `${jobPath(jobId)}/budget/lines.csv`;
export const memberBudgetCsvPath = (memberId: string) => `${memberBudgetPath(memberId)}/lines.csv`;
/** Where the browser downloads a sent budget's client summary. */
export const clientSummaryPath = (budgetId: string) =>
  `/api/budgets/${encodeURIComponent(budgetId)}/summary.pdf`;
