import { AppError } from '@/server/app-error';
import type { RequestAction } from '@/shared/schemas/requests/views';
import {
  REQUEST_STATE_LABELS,
  type RequestSide,
  type RequestState,
  type StatusChange,
} from '@/shared/schemas/requests/workflow';

/**
 * Who may do what from which state: Sent → In review → Needs info ↔ In review → Designed → Closed, Declined
 * by the engineer from any open state, the fee quoted and accepted inside review, revisions while open, and
 * a Designed request reopened with a question (a new version, back in review). Nothing else.
 */
interface Rule {
  side: RequestSide;
  from: readonly RequestState[];
}

const OPEN: readonly RequestState[] = ['sent', 'in-review', 'needs-info'];
const REVIEW: readonly RequestState[] = ['in-review', 'needs-info'];

export const RULES: Record<RequestAction, Rule> = {
  edit: { side: 'firm', from: ['draft', ...OPEN, 'designed'] },
  send: { side: 'firm', from: ['draft'] },
  revise: { side: 'firm', from: OPEN },
  reopen: { side: 'firm', from: ['designed'] },
  'accept-fee': { side: 'firm', from: REVIEW },
  'quote-fee': { side: 'engineer', from: REVIEW },
  reply: { side: 'engineer', from: REVIEW },
  'upload-design': { side: 'engineer', from: REVIEW },
  message: { side: 'firm', from: [...OPEN, 'designed', 'closed', 'declined'] },
  'to-in-review': { side: 'engineer', from: ['sent', 'needs-info'] },
  'to-needs-info': { side: 'engineer', from: ['in-review'] },
  'to-designed': { side: 'engineer', from: ['in-review'] },
  'to-closed': { side: 'firm', from: ['designed'] },
  'to-declined': { side: 'engineer', from: OPEN },
};

/** Both sides write in the thread; the firm may also say a Needs info question is answered. */
const BOTH: ReadonlySet<RequestAction> = new Set(['message']);
const FIRM_ALSO: Partial<Record<RequestAction, readonly RequestState[]>> = { 'to-in-review': ['needs-info'] };

function allowedFor(action: RequestAction, side: RequestSide): readonly RequestState[] | undefined {
  const rule = RULES[action];
  if (rule.side === side || BOTH.has(action)) return rule.from;
  if (side === 'firm') return FIRM_ALSO[action];
  return undefined;
}

/** True when `side` may take `action` with the request in `state` (prerequisites aside). */
export function may(action: RequestAction, side: RequestSide, state: RequestState): boolean {
  return allowedFor(action, side)?.includes(state) ?? false;
}

/** Throws 403 when the side never takes the action, 409 when the request's state does not allow it now. */
export function assertMay(action: RequestAction, side: RequestSide, state: RequestState): void {
  const from = allowedFor(action, side);
  if (!from) {
    const who = side === 'firm' ? 'the sending firm' : 'the engineer';
    throw new AppError('forbidden', `That is not ${who}’s to do`);
  }
  if (!from.includes(state)) {
    throw new AppError('conflict', `Not while the request is ${REQUEST_STATE_LABELS[state]}`);
  }
}

export const statusAction = (to: StatusChange['to']): RequestAction => `to-${to}`;

/** Every action the side may take now, for the screens. */
export function actionsFor(side: RequestSide, state: RequestState): RequestAction[] {
  return (Object.keys(RULES) as RequestAction[]).filter((action) => may(action, side, state));
}
