import { memo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { TextField } from '@/lib/ui/text-field';
import { FlagToggle } from './flag-toggle';
import type { InputFlag } from './source-draft';
import { TapeKeypad } from './tape-keypad';

type MeasureFieldProps = {
  label: string;
  hint?: string;
  value: string;
  onChangeText: (text: string) => void;
  unit?: string;
  errors?: string[];
  flag?: InputFlag;
  onFlag?: (flag: InputFlag) => void;
  /** Offer the feet | inches | sixteenths keypad (lengths read off a tape). */
  tape?: boolean;
  testID?: string;
};

/** A text field with its measured / assumed / default flag and, for lengths, a tape keypad below. */
function MeasureFieldView({
  label,
  hint,
  value,
  onChangeText,
  unit,
  errors,
  flag,
  onFlag,
  tape,
  testID,
}: MeasureFieldProps) {
  const [keypad, setKeypad] = useState(false);
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <View style={styles.field}>
          <TextField
            label={label}
            hint={hint}
            value={value}
            onChangeText={onChangeText}
            unit={unit}
            errors={errors}
            testID={testID}
            keyboardType="numbers-and-punctuation"
            autoCapitalize="none"
            autoCorrect={false}
          />
        </View>
        {flag && onFlag ? (
          <View style={styles.flag}>
            <FlagToggle
              field={label}
              flag={flag}
              onChange={onFlag}
              testID={testID ? `${testID}-flag` : undefined}
            />
          </View>
        ) : null}
      </View>
      {tape ? (
        <View style={styles.keypadToggle}>
          <Button
            label={keypad ? 'Hide tape keypad' : 'Tape keypad'}
            variant="quiet"
            testID={testID ? `${testID}-keypad` : undefined}
            onPress={() => setKeypad(!keypad)}
          />
        </View>
      ) : null}
      {tape && keypad ? (
        <TapeKeypad onText={onChangeText} testID={testID ? `${testID}-pad` : undefined} />
      ) : null}
    </View>
  );
}

/** Renders again only when its own props change: a keystroke in one field leaves the card's others alone. */
export const MeasureField = memo(MeasureFieldView);

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs, alignSelf: 'stretch' },
  row: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.sm },
  field: { flex: 1, minWidth: 0 },
  flag: { paddingBottom: 0 },
  keypadToggle: { flexDirection: 'row' },
});
