import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  buildFramingList,
  CalcInputError,
  nonbearingHeader,
  parseLength,
  PLATE_THICKNESS_IN,
} from '@/lib/calc';
import { formatIn } from '@/lib/format';
import { colors, spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { FieldMessages } from '@/lib/ui/field-messages';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import { framingInputSchema } from '@/shared/schemas/calc/framing';

const FLAT_2X4 = { label: '2x4 flat', depthIn: PLATE_THICKNESS_IN, plies: 1, flat: true };

function read(text: string, field: string, label: string, errors: Record<string, string[]>) {
  try {
    return parseLength(text, field, { defaultUnit: 'in', label });
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    errors[field] = [error.message];
    return undefined;
  }
}

/**
 * Next step for a likely nonbearing wall: the engine's nonbearing header rule for the opening (the gap to
 * the top plates worked out from the wall and opening heights) and, when it allows a flat 2x4, the framing list.
 */
export function NonbearingNext() {
  const [f, setF] = useState({ width: '36', height: '82-1/2', wall: '97-1/8' });
  const set = (key: keyof typeof f) => (value: string) => setF((o) => ({ ...o, [key]: value }));
  const out = useMemo(() => {
    const errors: Record<string, string[]> = {};
    const width = read(f.width, 'width', 'Rough opening width', errors);
    const height = read(f.height, 'height', 'Rough opening height', errors);
    const wall = read(f.wall, 'wall', 'Wall height', errors);
    if (width === undefined || height === undefined || wall === undefined) return { errors };
    // Bottom plate, the flat header and a double top plate sit between the opening and the ceiling.
    const gapIn = wall - height - PLATE_THICKNESS_IN - FLAT_2X4.depthIn - 2 * PLATE_THICKNESS_IN;
    const rule = nonbearingHeader({
      screenOutcome: 'likely-nonbearing',
      roughOpeningWidthIn: width,
      nailingSurfaceAboveIn: Math.max(0, gapIn),
    });
    if (rule.verdict !== 'flat-2x4') return { errors, rule, gapIn };
    const parsed = framingInputSchema.safeParse({
      roughOpeningWidthIn: width,
      roughOpeningHeightIn: height,
      wallHeightIn: wall,
      header: FLAT_2X4,
    });
    if (!parsed.success) {
      errors.wall = parsed.error.issues.map((i) => i.message);
      return { errors, rule, gapIn };
    }
    try {
      return { errors, rule, gapIn, list: buildFramingList(parsed.data) };
    } catch (error) {
      if (!(error instanceof CalcInputError)) throw error;
      return { errors: { ...errors, wall: [error.message] }, rule, gapIn };
    }
  }, [f]);
  return (
    <Card title="Header for the opening" testID="nonbearing-next">
      <View style={styles.grid}>
        <View style={styles.cell}>
          <TextField
            label="Rough opening width"
            unit="in"
            value={f.width}
            onChangeText={set('width')}
            errors={out.errors.width}
            testID="nb-width"
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Rough opening height"
            unit="in"
            value={f.height}
            onChangeText={set('height')}
            errors={out.errors.height}
            testID="nb-height"
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Wall height"
            hint="Floor to top of the top plates."
            unit="in"
            value={f.wall}
            onChangeText={set('wall')}
            errors={out.errors.wall}
            testID="nb-wall"
          />
        </View>
      </View>
      {out.rule ? (
        <View style={styles.rule} testID="nonbearing-rule">
          <Text variant="bodyStrong">{out.rule.message}</Text>
          <Text variant="caption" tone="muted">
            Gap from the header to the top plates: {formatIn(Math.max(0, out.gapIn ?? 0))}.{' '}
            {out.rule.reference}.
          </Text>
          {out.rule.reasons.map((r) => (
            <Text key={r}>• {r}</Text>
          ))}
          {out.rule.limits.map((l) => (
            <Text key={l} variant="caption">
              – {l}
            </Text>
          ))}
        </View>
      ) : null}
      {out.list ? (
        <View style={styles.list} testID="nonbearing-framing-list">
          <Text variant="label">Framing list</Text>
          {out.list.lines.map((line) => (
            <View key={line.item} style={styles.line}>
              <Text variant="bodyStrong">
                {line.qty} × {line.item} at {formatIn(line.lengthIn)}
              </Text>
              <Text variant="caption" tone="muted">
                Buy {line.stock.count} × {line.stock.label} · {line.note}
              </Text>
            </View>
          ))}
          {[...out.list.warnings, ...out.list.notes].map((w) => (
            <Text key={w} variant="caption">
              • {w}
            </Text>
          ))}
        </View>
      ) : null}
      <FieldMessages messages={out.errors._} />
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 160 },
  rule: { gap: spacing.xs },
  list: { gap: spacing.xs },
  line: { paddingVertical: spacing.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
});
