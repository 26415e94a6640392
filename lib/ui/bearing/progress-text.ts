import type { ChecklistProgress } from '@/shared/schemas/job-checklist';

/**
 * A checklist's progress in words: settled items (done or not needed) of all.
 * @example progressText({ done: 2, notNeeded: 1, toDo: 9, total: 12 }) // 'Checklist 3 of 12 settled (2 done, 1 not needed)'
 */
export function progressText(p: ChecklistProgress): string {
  return `Checklist ${p.done + p.notNeeded} of ${p.total} settled (${p.done} done, ${p.notNeeded} not needed)`;
}
