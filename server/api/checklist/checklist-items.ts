import {
  LEAD_SAFE_BEFORE_YEAR,
  checklistItems,
  type ChecklistItem,
  type ChecklistProgress,
} from '@/shared/schemas/job-checklist';
import type { EngineerNeeded } from '@/shared/schemas/bearing-screens';
import type { ChecklistRow } from './checklist.repository';

interface Start {
  state: ChecklistItem['state'];
  raised: boolean;
  because: string;
}

/**
 * Where an item nobody has set starts: lead-safe practice is raised for a house built before 1978 or of
 * unknown year (EPA Renovation, Repair and Painting rule, 40 CFR 745) and starts "not needed" otherwise; the
 * engineer's design is raised while a screen of the job says engineer required.
 */
export function startOf(
  key: ChecklistItem['key'],
  yearBuilt: number | null,
  engineer: EngineerNeeded,
): Start {
  if (key === 'lead-safe') {
    if (yearBuilt === null) {
      return {
        state: 'to-do',
        raised: true,
        because: `Year built unknown: treat the house as built before ${LEAD_SAFE_BEFORE_YEAR} (EPA RRP rule, 40 CFR 745).`,
      };
    }
    return yearBuilt < LEAD_SAFE_BEFORE_YEAR
      ? {
          state: 'to-do',
          raised: true,
          because: `Built in ${yearBuilt}, before ${LEAD_SAFE_BEFORE_YEAR} (EPA RRP rule, 40 CFR 745).`,
        }
      : {
          state: 'not-needed',
          raised: false,
          because: `Built in ${yearBuilt}, in or after ${LEAD_SAFE_BEFORE_YEAR}: the EPA RRP rule's pre-1978 trigger does not apply.`,
        };
  }
  if (key === 'engineer-design' && engineer.needed) {
    const walls = [...new Set(engineer.reasons.map((r) => r.wallLabel))].join(', ');
    return { state: 'to-do', raised: true, because: `Engineer required by the bearing screen of: ${walls}.` };
  }
  return { state: 'to-do', raised: false, because: '' };
}

/** The job's items: each set one as set, the others at their starting state. */
export function checklistOf(
  yearBuilt: number | null,
  engineer: EngineerNeeded,
  rows: ChecklistRow[],
): ChecklistItem[] {
  return checklistItems.map((item): ChecklistItem => {
    const start = startOf(item.key, yearBuilt, engineer);
    const row = rows.find((r) => r.itemKey === item.key);
    return {
      key: item.key,
      title: item.title,
      detail: item.detail,
      state: row?.state ?? start.state,
      note: row?.note ?? '',
      raised: start.raised,
      because: start.because,
      updatedBy: row?.updatedBy ?? null,
      updatedByName: row?.updatedByName ?? null,
      updatedAt: row?.updatedAt ?? null,
      version: row?.version ?? 0,
    };
  });
}

/** Done and not-needed items count as settled; the rest are to do. */
export function progressOf(items: Pick<ChecklistItem, 'state'>[]): ChecklistProgress {
  const done = items.filter((i) => i.state === 'done').length;
  const notNeeded = items.filter((i) => i.state === 'not-needed').length;
  return { done, notNeeded, toDo: items.length - done - notNeeded, total: items.length };
}
