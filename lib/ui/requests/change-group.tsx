import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import type { DiffGroup } from '@/lib/requests/version-diff';
import { colors, iconSize, layout, radii, spacing } from '@/lib/theme';
import { Icon } from '../icon';
import { Text } from '../text';
import { ChangeLineRow } from './change-line-row';

const KIND_WORDS = { changed: '', added: ' · added in this version', removed: ' · removed in this version' };
const changes = (n: number) => `${n} ${n === 1 ? 'change' : 'changes'}`;

/** A member (or the request's own parts) with its changes by section; the heading folds it, with its count. */
export function ChangeGroup({
  group,
  from,
  to,
  stacked,
  openAtFirst,
}: {
  group: DiffGroup;
  from: number;
  to: number;
  stacked: boolean;
  openAtFirst: boolean;
}) {
  const [open, setOpen] = useState(openAtFirst);
  return (
    <View style={styles.group} testID="change-group">
      <Pressable
        role="button"
        aria-expanded={open}
        onPress={() => setOpen(!open)}
        style={({ pressed }) => [styles.head, pressed && styles.pressed]}
        testID="change-group-toggle"
      >
        <Icon
          name={group.kind === 'changed' ? 'edit' : group.kind === 'added' ? 'plus' : 'error'}
          size={iconSize.md}
        />
        <View style={styles.headText}>
          <Text variant="bodyStrong">
            {group.title}
            {KIND_WORDS[group.kind]}
          </Text>
          <Text variant="caption" tone="muted">
            {open ? `${changes(group.count)} · tap to fold` : `${changes(group.count)} · tap to show them`}
          </Text>
        </View>
        <Icon name="chevronRight" size={iconSize.md} />
      </Pressable>
      {open
        ? group.sections.map((section) => (
            <View key={section.id} style={styles.section}>
              <Text variant="caption" tone="muted" style={styles.sectionTitle}>
                {section.title.toUpperCase()}
              </Text>
              {section.lines.map((line, index) => (
                <ChangeLineRow
                  key={`${line.field}-${index}`}
                  line={line}
                  from={from}
                  to={to}
                  stacked={stacked}
                />
              ))}
            </View>
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm, borderTopWidth: 1, borderColor: colors.line, paddingTop: spacing.sm },
  head: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    minHeight: layout.touchTarget,
    borderRadius: radii.sm,
  },
  headText: { flex: 1, gap: spacing.xxs },
  pressed: { backgroundColor: colors.overlay },
  section: { gap: spacing.sm, paddingLeft: spacing.sm },
  sectionTitle: { letterSpacing: 0.5 },
});
