import type { CheckId } from '@/shared/schemas/calc/member';

/** Each check's name in words, for lists that only carry its id. */
export const checkNames: Record<CheckId, string> = {
  bending: 'bending',
  shear: 'shear',
  'deflection-live': 'live-load deflection',
  'deflection-total': 'total deflection',
  bearing: 'bearing',
};

/** The name of a check id, or the id itself when it is not one of the member checks. */
export function checkName(id: string): string {
  return (checkNames as Record<string, string>)[id] ?? id;
}
