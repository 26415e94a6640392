import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';
import { Text } from '@/lib/ui/text';
import {
  emptyTapeEntry,
  pressBackspace,
  pressDigit,
  tapeText,
  type TapeEntry,
  type TapePart,
} from './tape-entry';

const parts: { part: TapePart; label: string }[] = [
  { part: 'feet', label: 'Feet' },
  { part: 'inches', label: 'Inches' },
  { part: 'sixteenths', label: '16ths' },
];
const digits = [1, 2, 3, 4, 5, 6, 7, 8, 9, 0];

function Key({
  label,
  onPress,
  active,
  testID,
}: {
  label: string;
  onPress: () => void;
  active?: boolean;
  testID?: string;
}) {
  return (
    <Pressable
      role="button"
      accessibilityRole="button"
      aria-label={label}
      aria-pressed={active}
      testID={testID}
      onPress={onPress}
      style={({ pressed }) => [styles.key, active && styles.active, pressed && styles.pressed]}
    >
      <Text variant="bodyStrong" tone={active ? 'onAccent' : 'ink'}>
        {label}
      </Text>
    </Pressable>
  );
}

/** A keypad for a tape reading: pick feet, inches or sixteenths, key the digits; the field gets the text. */
export function TapeKeypad({ onText, testID }: { onText: (text: string) => void; testID?: string }) {
  const [entry, setEntry] = useState<TapeEntry>(emptyTapeEntry);
  const update = (next: TapeEntry) => {
    setEntry(next);
    onText(tapeText(next));
  };
  return (
    <View style={styles.pad} testID={testID}>
      <View style={styles.row}>
        {parts.map(({ part, label }) => (
          <Key
            key={part}
            label={`${label} ${entry[part] || '–'}`}
            active={entry.part === part}
            testID={testID ? `${testID}-${part}` : undefined}
            onPress={() => setEntry({ ...entry, part })}
          />
        ))}
      </View>
      <View style={styles.grid}>
        {digits.map((d) => (
          <Key
            key={d}
            label={String(d)}
            testID={testID ? `${testID}-${d}` : undefined}
            onPress={() => update(pressDigit(entry, d))}
          />
        ))}
        <Key label="⌫ Back" onPress={() => update(pressBackspace(entry))} />
        <Key label="Clear" onPress={() => update(emptyTapeEntry())} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pad: {
    gap: spacing.sm,
    padding: spacing.sm,
    borderRadius: radii.md,
    backgroundColor: colors.surfaceSunken,
  },
  row: { flexDirection: 'row', gap: spacing.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  key: {
    flexGrow: 1,
    flexBasis: '28%',
    minHeight: layout.touchTarget,
    alignItems: 'center',
    justifyContent: 'center',
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
  },
  active: { backgroundColor: colors.accent, borderColor: colors.accent },
  pressed: { backgroundColor: colors.overlay },
});
