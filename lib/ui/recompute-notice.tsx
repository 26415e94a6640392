import type { MemberRecompute } from '@/shared/schemas/job-update';
import { Notice } from './notice';
import { recomputeText } from './recompute-text';
import { Text } from './text';

/** After a job save: the members the server checked again, those that changed state named one by one. */
export function RecomputeNotice({ recomputed }: { recomputed: readonly MemberRecompute[] }) {
  const text = recomputeText(recomputed);
  if (!text) return null;
  return (
    <Notice
      tone={text.changed.length > 0 ? 'warning' : 'info'}
      title={text.title}
      testID="members-recomputed"
    >
      {text.changed.map((line) => (
        <Text key={line}>{line}</Text>
      ))}
      {text.unchanged ? <Text tone="muted">{text.unchanged}</Text> : null}
    </Notice>
  );
}
