import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { buildFramingList, CalcInputError, type FramingList } from '@/lib/calc';
import { formatFtIn, formatIn } from '@/lib/format';
import { colors, spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { FieldMessages } from '@/lib/ui/field-messages';
import { Text } from '@/lib/ui/text';
import { framingInputSchema } from '@/shared/schemas/calc/framing';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { designedHeader } from './designed-header';
import { MeasureField } from './measure-field';
import { DraftReader } from './member-input';

type Opening = {
  width: string;
  height: string;
  sill: string;
  wallLeft: string;
  wallRight: string;
  topPlates: string;
};

/** Houses built before this year often have a single top plate (common practice); the framing list asks. */
const SINGLE_PLATE_BEFORE = 1950;

function ListLines({ list, title }: { list: FramingList; title: string }) {
  return (
    <View style={styles.list}>
      <Text variant="label">{title}</Text>
      {list.lines.map((line) => (
        <View key={line.item} style={styles.line}>
          <Text variant="bodyStrong">
            {line.qty} × {line.item} at {formatIn(line.lengthIn)}
          </Text>
          <Text variant="caption" tone="muted">
            Buy {line.stock.count} × {line.stock.label} · {line.note}
          </Text>
        </View>
      ))}
      {[...list.warnings, ...list.notes].map((w) => (
        <Text key={w} variant="caption">
          • {w}
        </Text>
      ))}
    </View>
  );
}

/**
 * A header's framing list from the rough opening and the wall height at each end: at the preliminary size,
 * or once the engineer has designed the member, at the engineer's member and bearing.
 */
export function FramingCard({
  result,
  yearBuilt,
  design,
}: {
  result: MemberCheckResult;
  yearBuilt: number | null;
  design?: MemberDesign;
}) {
  const [opening, setOpening] = useState<Opening>(() => ({
    width: formatIn(result.spans.clearSpanFt * 12),
    height: '82-1/2',
    sill: '0',
    wallLeft: '97-1/8',
    wallRight: '97-1/8',
    topPlates: yearBuilt !== null && yearBuilt < SINGLE_PLATE_BEFORE ? '1' : '2',
  }));
  const set = (key: keyof Opening) => (value: string) => setOpening((o) => ({ ...o, [key]: value }));
  const designed = useMemo(() => (design ? designedHeader(design) : null), [design]);
  const fromDesign = designed && 'header' in designed ? designed : null;
  const lists = useMemo(() => {
    const r = new DraftReader();
    const errors = r.errors;
    const width = r.parsedLength('width', opening.width, 'Rough opening width', 'in');
    const height = r.parsedLength('height', opening.height, 'Rough opening height', 'in');
    const sill = r.parsedLength('sill', opening.sill, 'Sill height', 'in');
    const ends = [
      r.parsedLength('wallLeft', opening.wallLeft, 'Wall height, left', 'in'),
      r.parsedLength('wallRight', opening.wallRight, 'Wall height, right', 'in'),
    ];
    const out: FramingList[] = [];
    for (const [i, wall] of ends.entries()) {
      const parsed = framingInputSchema.safeParse({
        roughOpeningWidthIn: width,
        roughOpeningHeightIn: height,
        sillHeightIn: sill,
        wallHeightIn: wall,
        topPlates: Number(opening.topPlates),
        jacksPerSide: fromDesign?.jacksPerSide ?? result.bearing.jackStuds,
        header: fromDesign?.header ?? {
          label: result.member.sizeLabel.replace(/^\d-ply /, ''),
          depthIn: result.member.dIn,
          plies: result.member.plies,
          engineered: !result.member.materialId.startsWith('sawn-'),
        },
      });
      if (!parsed.success) {
        errors[i === 0 ? 'wallLeft' : 'wallRight'] ??= parsed.error.issues.map((issue) => issue.message);
        continue;
      }
      try {
        out.push(buildFramingList(parsed.data));
      } catch (error) {
        if (!(error instanceof CalcInputError)) throw error;
        errors[i === 0 ? 'wallLeft' : 'wallRight'] = [error.message];
      }
    }
    return { errors, out };
  }, [opening, result, fromDesign]);
  const same = opening.wallLeft.trim() === opening.wallRight.trim();
  const e = lists.errors;
  return (
    <Card title="Framing list" testID="framing-list">
      {design ? (
        <Text variant="caption" testID="framing-from-design">
          {fromDesign
            ? `Rebuilt from the engineer’s member: ${design.designation} (request ${design.requestNumber}, version ${design.version}). The preliminary ${design.preliminaryLabel} is superseded.`
            : designed && 'problem' in designed
              ? designed.problem
              : null}
        </Text>
      ) : null}
      <View style={styles.grid}>
        <View style={styles.cell}>
          <MeasureField
            label="Rough opening width"
            unit="in"
            tape
            value={opening.width}
            onChangeText={set('width')}
            errors={e.width}
            testID="ro-width"
          />
        </View>
        <View style={styles.cell}>
          <MeasureField
            label="Rough opening height"
            unit="in"
            value={opening.height}
            onChangeText={set('height')}
            errors={e.height}
            testID="ro-height"
          />
        </View>
        <View style={styles.cell}>
          <MeasureField
            label="Sill height (0 for a door)"
            unit="in"
            value={opening.sill}
            onChangeText={set('sill')}
            errors={e.sill}
            testID="ro-sill"
          />
        </View>
        <View style={styles.cell}>
          <MeasureField
            label="Wall height, left end"
            hint="Floor to top of the top plates."
            unit="in"
            value={opening.wallLeft}
            onChangeText={set('wallLeft')}
            errors={e.wallLeft}
            testID="wall-left"
          />
        </View>
        <View style={styles.cell}>
          <MeasureField
            label="Wall height, right end"
            hint="Old floors are seldom level."
            unit="in"
            value={opening.wallRight}
            onChangeText={set('wallRight')}
            errors={e.wallRight}
            testID="wall-right"
          />
        </View>
        <View style={styles.cell}>
          <MeasureField
            label="Top plates"
            hint="Older houses often have one."
            value={opening.topPlates}
            onChangeText={set('topPlates')}
            testID="top-plates"
          />
        </View>
      </View>
      <FieldMessages messages={e._} />
      {lists.out.length === 2 ? (
        same ? (
          <ListLines
            list={lists.out[0]}
            title={`Cut list (header ${formatFtIn(lists.out[0].headerLengthIn)})`}
          />
        ) : (
          <>
            <ListLines list={lists.out[0]} title="Cut list at the left end's wall height" />
            <ListLines list={lists.out[1]} title="Cut list at the right end's wall height" />
          </>
        )
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 160 },
  list: { gap: spacing.xs },
  line: { paddingVertical: spacing.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
});
