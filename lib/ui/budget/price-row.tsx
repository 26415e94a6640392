import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { setPrice } from '@/lib/api/price-book';
import { amountText, parseAmountText, type PriceUnit } from '@/lib/budget';
import { colors, spacing } from '@/lib/theme';
import type { PriceItem } from '@/shared/schemas/price-book';
import { Button } from '../button';
import { Icon } from '../icon';
import { Text } from '../text';
import { TextField } from '../text-field';
import { unitWords } from './unit-words';

type Row = Pick<PriceItem, 'key' | 'description' | 'unit'> & Partial<PriceItem>;

/** One price: its value in its unit, when and by whom it was set, stale in words; editable by writers. */
export function PriceRow({ item, canEdit, onSaved }: { item: Row; canEdit: boolean; onSaved: () => void }) {
  const unit = item.unit as PriceUnit;
  const [text, setText] = useState(item.amount === undefined ? '' : amountText(item.amount, unit));
  const [errors, setErrors] = useState<string[]>([]);
  const [busy, setBusy] = useState(false);
  const changed = item.amount === undefined ? text.trim() !== '' : text !== amountText(item.amount, unit);

  const save = async () => {
    const parsed = parseAmountText(text, unit);
    if ('error' in parsed) return setErrors([parsed.error]);
    setBusy(true);
    try {
      await setPrice({ key: item.key, amount: parsed.amount, note: item.note ?? '' });
      setErrors([]);
      onSaved();
    } catch (error) {
      setErrors(
        error instanceof ApiError
          ? Object.values(error.fields).flat().length
            ? Object.values(error.fields).flat()
            : [error.message]
          : ['Could not save'],
      );
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.row} testID={`price-${item.key}`}>
      <View style={styles.text}>
        <Text variant="bodyStrong">{item.description}</Text>
        <Text variant="caption" tone="muted">
          {item.setAt ? `Set ${item.setAt.slice(0, 10)} by ${item.setBy?.name}` : 'No price yet'}
        </Text>
        {item.stale ? (
          <View style={styles.stale}>
            <Icon name="warning" color={colors.warning} />
            <Text variant="caption" style={styles.staleText}>
              Stale: older than the firm’s age for prices
            </Text>
          </View>
        ) : null}
      </View>
      <View style={styles.edit}>
        <TextField
          label={`Value (${unitWords[unit]})`}
          value={text}
          onChangeText={setText}
          editable={canEdit}
          inputMode="decimal"
          errors={errors}
          testID={`price-input-${item.key}`}
        />
        {canEdit && changed ? (
          <Button label="Save" busy={busy} onPress={save} testID={`price-save-${item.key}`} />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: spacing.md,
    paddingVertical: spacing.md,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  text: { flexGrow: 1, flexBasis: 220, gap: spacing.xxs },
  edit: { flexBasis: 200, flexGrow: 1, gap: spacing.sm },
  stale: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  staleText: { color: colors.warning },
});
