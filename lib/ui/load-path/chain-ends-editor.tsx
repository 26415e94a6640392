import { StyleSheet, View } from 'react-native';
import { chainBelow } from '@/lib/calc/load-path';
import { spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { Text } from '@/lib/ui/text';
import type { LoadStandard } from '@/shared/schemas/jobs';
import type { JobLoadPath } from '@/shared/schemas/load-path-elements';
import { EndBearingEditor } from './end-bearing-editor';
import { kindWords, pathStateLook } from './words';

/**
 * The ends of a member and of everything under it, each with "What does this end bear on?", from the member
 * down: answering one end brings the next element's ends in, until the chain reaches the ground.
 */
export function ChainEndsEditor({
  startId,
  loadPath,
  edition,
  onSaved,
}: {
  startId: string;
  loadPath: JobLoadPath;
  edition: LoadStandard;
  onSaved: () => Promise<void>;
}) {
  const memberIds = new Set(loadPath.members.map((m) => m.id));
  const steps = chainBelow(loadPath.result, startId).filter((s) => s.element.ends.length > 0);
  return (
    <View style={styles.list}>
      {steps.map(({ element }) => {
        const look = pathStateLook[element.state];
        return (
          <Card key={element.id} title={element.label} testID={`chain-${element.label}`}>
            <Text variant="caption" tone="muted">
              {kindWords[element.kind]}
            </Text>
            <Text tone={look.tone} testID="chain-state">
              {look.word}
            </Text>
            {element.ends.map((end) => (
              <EndBearingEditor
                key={`${element.id}-${end.end}`}
                owner={{
                  id: element.id,
                  isMember: memberIds.has(element.id),
                  kind: element.kind,
                  label: element.label,
                }}
                end={end.end}
                loadPath={loadPath}
                edition={edition}
                onSaved={onSaved}
              />
            ))}
          </Card>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: spacing.lg } });
