import type { IconName } from './icon';
import type { MemberState } from '@/shared/schemas/members';

/** A member's state in words and an icon (never colour alone). */
export const memberStateLook: Record<MemberState, { word: string; icon: IconName; tone: 'ink' | 'danger' }> =
  {
    passes: { word: 'Passes the preliminary check', icon: 'check', tone: 'ink' },
    fails: { word: 'Fails the preliminary check', icon: 'error', tone: 'danger' },
    'engineer-needed': {
      word: 'Passes the preliminary check — engineer needed',
      icon: 'warning',
      tone: 'ink',
    },
    'load-path-open': {
      word: 'Load path open — say what each end bears on, down to a footing',
      icon: 'warning',
      tone: 'danger',
    },
  };
