import { useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, layout, radii, spacing, typeScale } from '@/lib/theme';
import { FieldMessages } from './field-messages';
import { Text } from './text';

type TextFieldProps = Omit<TextInputProps, 'style' | 'placeholderTextColor'> & {
  label: string;
  hint?: string;
  errors?: string[];
  /** Unit shown after the input, e.g. "ft" or "psf". */
  unit?: string;
};

/** Labelled text input with a hint and its field-level error messages below. */
export function TextField({
  label,
  hint,
  errors,
  unit,
  multiline,
  editable,
  onFocus,
  onBlur,
  ...rest
}: TextFieldProps) {
  const [focused, setFocused] = useState(false);
  const invalid = Boolean(errors?.length);
  return (
    <View style={styles.wrap}>
      <Text variant="label">{label}</Text>
      {hint ? (
        <Text variant="caption" tone="muted">
          {hint}
        </Text>
      ) : null}
      <View style={styles.row}>
        <TextInput
          aria-label={label}
          accessibilityLabel={label}
          aria-invalid={invalid}
          placeholderTextColor={colors.inkMuted}
          multiline={multiline}
          editable={editable}
          onFocus={(e) => {
            setFocused(true);
            onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            onBlur?.(e);
          }}
          style={[
            styles.input,
            multiline && styles.multiline,
            focused && styles.focused,
            invalid && styles.invalid,
            editable === false && styles.readOnly,
          ]}
          {...rest}
        />
        {unit ? (
          <Text variant="bodyStrong" tone="muted" style={styles.unit}>
            {unit}
          </Text>
        ) : null}
      </View>
      <FieldMessages messages={errors} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs, alignSelf: 'stretch' },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  input: {
    ...typeScale.body,
    flex: 1,
    minWidth: 0,
    minHeight: layout.touchTarget,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 2,
    borderColor: colors.lineStrong,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    color: colors.ink,
  },
  multiline: { minHeight: 120, textAlignVertical: 'top' },
  focused: { borderColor: colors.focus },
  invalid: { borderColor: colors.danger },
  readOnly: { backgroundColor: colors.surfaceSunken, borderColor: colors.line },
  unit: { minWidth: 36 },
});
