import type { IconName } from '@/lib/ui/icon';
import type { BearingScreenOutcome } from '@/shared/schemas/calc/framing';

/** Each screen outcome in words and an icon (never colour alone). */
export const outcomeLook: Record<
  BearingScreenOutcome,
  { word: string; icon: IconName; tone: 'info' | 'success' | 'warning' | 'error' }
> = {
  'likely-bearing': { word: 'Likely bearing', icon: 'warning', tone: 'warning' },
  'likely-nonbearing': { word: 'Likely nonbearing', icon: 'check', tone: 'success' },
  'engineer-required': { word: 'Engineer required', icon: 'error', tone: 'error' },
  'cant-tell': { word: 'Can’t tell yet', icon: 'info', tone: 'info' },
};

/** How each reason is marked in the list. */
export const reasonLook: Record<string, { word: string; icon: IconName }> = {
  engineer: { word: 'Engineer', icon: 'error' },
  bearing: { word: 'Load', icon: 'warning' },
  clear: { word: 'Clear', icon: 'check' },
  unknown: { word: 'Not known', icon: 'info' },
};
