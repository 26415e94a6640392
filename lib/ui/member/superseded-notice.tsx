import { DESIGNED_MATERIAL_LABELS } from '@/shared/schemas/requests/reply';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import { TextLink } from '@/lib/ui/text-link';

/** Says the preliminary size is superseded by the engineer's member, and links the request it came from. */
export function SupersededNotice({ design }: { design: MemberDesign }) {
  const details = [design.plyFastening, design.hangers, design.posts, design.footing, design.connections]
    .filter(Boolean)
    .join(' · ');
  return (
    <Notice tone="info" title="Preliminary size superseded" testID="superseded-notice">
      <Text variant="bodyStrong" testID="superseded-by">
        Engineer’s member: {design.designation} ({DESIGNED_MATERIAL_LABELS[design.material]})
      </Text>
      <Text>
        It replaces the preliminary {design.preliminaryLabel}. The check below is kept for reference; build to
        the engineer’s design.
      </Text>
      {details ? (
        <Text variant="caption" tone="muted">
          {details}
        </Text>
      ) : null}
      <TextLink
        href={`/requests/${design.requestId}`}
        label={`Design request ${design.requestNumber}, version ${design.version}`}
      />
    </Notice>
  );
}
