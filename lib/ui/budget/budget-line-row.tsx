import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { parseAmountText } from '@/lib/budget';
import { formatDollars } from '@/lib/format/money';
import { colors, spacing } from '@/lib/theme';
import type { BudgetLineView, LineOverrideInput } from '@/shared/schemas/budgets';
import { Button } from '../button';
import { Icon } from '../icon';
import { Text } from '../text';
import { TextField } from '../text-field';

const qty = (n: number) => String(Math.round(n * 100) / 100);

type Props = {
  line: BudgetLineView;
  canEdit: boolean;
  onOverride: (id: string, change: LineOverrideInput | null) => Promise<void>;
};

/** One budget line: quantity × unit price = amount, how it was found, and an override with its note. */
export function BudgetLineRow({ line, canEdit, onOverride }: Props) {
  const [open, setOpen] = useState(false);
  const [quantity, setQuantity] = useState(qty(line.quantity));
  const [amount, setAmount] = useState('');
  const [note, setNote] = useState(line.override?.note ?? '');
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [busy, setBusy] = useState(false);

  const save = async () => {
    const change: LineOverrideInput = { note: note.trim() };
    const problems: Record<string, string[]> = {};
    if (!change.note) problems.note = ['Say why the line changed'];
    if (amount.trim()) {
      const parsed = parseAmountText(amount, 'each');
      if ('error' in parsed) problems.amount = [parsed.error];
      else change.amountCents = parsed.amount;
    } else {
      const q = Number(quantity);
      if (!Number.isFinite(q) || q < 0) problems.quantity = ['Enter a quantity of 0 or more'];
      else change.quantity = q;
    }
    setErrors(problems);
    if (Object.keys(problems).length) return;
    setBusy(true);
    try {
      await onOverride(line.id, change);
      setOpen(false);
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.row} testID={`line-${line.id}`}>
      <View style={styles.head}>
        <View style={styles.text}>
          <Text variant="bodyStrong">{line.label}</Text>
          <Text variant="caption" tone="muted">
            {qty(line.quantity)} {line.unit}
            {line.unitCents !== null ? ` × ${formatDollars(line.unitCents, true)}` : ''} · {line.basis}
          </Text>
          {line.missingPrice ? <Flag icon="warning" text="No price in the price book" /> : null}
          {line.stalePrice ? <Flag icon="warning" text="Stale price" /> : null}
          {line.override ? (
            <Flag
              icon="edit"
              text={`Changed: ${line.override.note} (was ${formatDollars(line.override.computedCents, true)})`}
            />
          ) : null}
        </View>
        <Text variant="bodyStrong" testID={`line-amount-${line.id}`}>
          {formatDollars(line.amountCents, true)}
        </Text>
      </View>
      {canEdit && !open ? (
        <View style={styles.actions}>
          <Button
            label={line.override ? 'Change override' : 'Override'}
            variant="quiet"
            onPress={() => setOpen(true)}
          />
          {line.override ? (
            <Button label="Undo override" variant="quiet" onPress={() => onOverride(line.id, null)} />
          ) : null}
        </View>
      ) : null}
      {open ? (
        <View style={styles.form}>
          <TextField
            label={line.unit === '%' ? 'Percent' : `Quantity (${line.unit})`}
            value={quantity}
            onChangeText={setQuantity}
            inputMode="decimal"
            errors={errors.quantity}
          />
          <TextField
            label="Or a fixed amount ($)"
            hint="Replaces the quantity × unit price"
            value={amount}
            onChangeText={setAmount}
            inputMode="decimal"
            errors={errors.amount}
          />
          <TextField label="Why (note)" value={note} onChangeText={setNote} errors={errors.note} />
          <View style={styles.actions}>
            <Button label="Save override" busy={busy} onPress={save} />
            <Button label="Cancel" variant="secondary" onPress={() => setOpen(false)} />
          </View>
        </View>
      ) : null}
    </View>
  );
}

function Flag({ icon, text }: { icon: 'warning' | 'edit'; text: string }) {
  return (
    <View style={styles.flag}>
      <Icon name={icon} color={colors.warning} />
      <Text variant="caption" style={styles.flagText}>
        {text}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.line, gap: spacing.xs },
  head: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  text: { flex: 1, gap: spacing.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  form: { gap: spacing.sm },
  flag: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  flagText: { color: colors.warning, flexShrink: 1 },
});
