import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { Button } from '../button';
import { FieldMessages } from '../field-messages';
import { Text } from '../text';
import { TextField } from '../text-field';

/** At most this many products (shared/schemas/requests/compose.ts). */
const MAX_PRODUCTS = 10;

type Row = { product: string; eGrade: string };

/** The engineered lumber the local yard stocks, one row per product with its E grade. */
export function YardStockRows({
  rows,
  onChange,
  errors,
}: {
  rows: Row[];
  onChange: (rows: Row[]) => void;
  errors: Record<string, string[]>;
}) {
  const set = (index: number, patch: Partial<Row>) =>
    onChange(rows.map((row, i) => (i === index ? { ...row, ...patch } : row)));
  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        What the engineer can specify without a special order. Read the product and its E grade (stiffness, in
        millions of psi) off the yard’s list or the stamp on the piece.
      </Text>
      {rows.map((row, i) => (
        <View key={i} style={styles.row} testID="compose-yard-row">
          <View style={styles.cell}>
            <TextField
              label={`Product ${i + 1}`}
              placeholder="e.g. 1-3/4 × 11-7/8 in LVL"
              value={row.product}
              onChangeText={(product) => set(i, { product })}
              errors={errors[`phoneBack.yardStock.${i}.product`]}
              testID={`compose-yard-product-${i}`}
            />
          </View>
          <View style={styles.grade}>
            <TextField
              label="E grade"
              placeholder="e.g. 2.0E"
              value={row.eGrade}
              onChangeText={(eGrade) => set(i, { eGrade })}
              errors={errors[`phoneBack.yardStock.${i}.eGrade`]}
              testID={`compose-yard-grade-${i}`}
            />
          </View>
          <Button
            label="Remove"
            variant="quiet"
            onPress={() => onChange(rows.filter((_, j) => j !== i))}
            testID={`compose-yard-remove-${i}`}
          />
        </View>
      ))}
      <FieldMessages messages={errors['phoneBack.yardStock']} />
      {rows.length < MAX_PRODUCTS ? (
        <Button
          label="Add a product"
          icon="plus"
          variant="secondary"
          onPress={() => onChange([...rows, { product: '', eGrade: '' }])}
          testID="compose-yard-add"
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: spacing.sm,
    padding: spacing.sm,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
  },
  cell: { flexGrow: 2, flexBasis: 200 },
  grade: { flexGrow: 1, flexBasis: 100 },
});
