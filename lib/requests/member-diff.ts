import type { LoadSource } from '@/shared/schemas/calc/loads';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { SnapshotMember } from '@/shared/schemas/requests/snapshot';
import {
  compareFields,
  compareKeyed,
  ftText,
  idText,
  inText,
  lbText,
  numberText,
  psfText,
  yesNo,
  type DiffLine,
  type Field,
} from './diff-fields';
import { materialName, sizeName } from './catalogue-names';
import { loadFields, loadName, describeLoad } from './load-diff';

/** Each input's flag, as the engine echoes it: the flag given, else assumed when entered, default when not. */
function withFlag(
  member: SnapshotMember,
  field: keyof MemberCheckInput,
  value: string | null,
): string | null {
  if (value === null) return null;
  const given = member.input[field] !== undefined;
  const flag = member.input.flags?.[field] ?? (given ? 'assumed' : 'default');
  return `${value} (${flag})`;
}

/** An input field shown in its unit with its flag. */
const input = <K extends keyof MemberCheckInput>(
  label: string,
  field: K,
  format: (value: NonNullable<MemberCheckInput[K]>) => string | null,
): Field<SnapshotMember> => [
  label,
  (m) => {
    const value = m.input[field];
    return value === undefined || value === null ? null : withFlag(m, field, format(value as never));
  },
];

const MOUNT_WORDS = {
  dropped: 'Dropped below the joists',
  flush: 'Flush with the joists',
  raised: 'Raised into the attic',
};
const SUPPORT_WORDS = { jacks: 'Jack studs on a wall plate', post: 'Posts' };
const DEFLECTION_WORDS = {
  floor: 'Floor (L/360 live)',
  'floor-tile': 'Floor under tile (L/480 live)',
  'floor-stone': 'Floor under stone',
  'plaster-ceiling': 'Plaster ceiling (L/360)',
  'gypsum-ceiling': 'Gypsum ceiling (L/240)',
  roof: 'Roof (L/240)',
  'roof-no-ceiling': 'Roof, no ceiling (L/180)',
};
const STATE_WORDS = {
  passes: 'Passes',
  fails: 'Fails',
  'engineer-needed': 'Passes — engineer needed',
  'load-path-open': 'Load path open',
};

/** Spans as the engine used them (the defaults filled in), with the input's flag. */
const span = (
  label: string,
  field: keyof MemberCheckInput & keyof SnapshotMember['result']['spans'],
  format: (v: number) => string | null,
): Field<SnapshotMember> => [
  label,
  (m) => {
    const value = m.result.spans[field];
    return value === undefined ? null : withFlag(m, field, format(value));
  },
];

const spanFields: Field<SnapshotMember>[] = [
  span('Clear span', 'clearSpanFt', ftText),
  span('Second clear span (continuous over a centre post)', 'secondClearSpanFt', ftText),
  span('Overhang past the left support', 'overhangLeftFt', ftText),
  span('Overhang past the right support', 'overhangRightFt', ftText),
  span('Bearing length, left end', 'bearingLeftIn', inText),
  span('Bearing length, right end', 'bearingRightIn', inText),
  span('Bearing length on the centre post', 'centreBearingIn', inText),
  ['Design span', (m) => ftText(m.result.spans.designSpanFt)],
  ['Length to buy', (m) => ftText(m.result.spans.lengthToBuyFt)],
  input('Bears on', 'supportKind', (v) => SUPPORT_WORDS[v]),
  input('Support width', 'supportWidthIn', inText),
  input('Plate under the jack studs', 'plateMaterialId', materialName),
  input('How it sits', 'mount', (v) => MOUNT_WORDS[v]),
  input('Joist depth', 'joistDepthIn', inText),
  input('Joist spacing', 'joistSpacingIn', inText),
  input('Joists frame in from both sides', 'joistsBothSides', (v) => yesNo(v)),
  input('Height to the underside of the joists', 'underJoistsHeightIn', inText),
  input('Least headroom', 'minHeadroomIn', inText),
  input('Attic clearance', 'atticClearanceIn', inText),
  input('Unbraced length of the top edge', 'unbracedLengthFt', ftText),
  input('Posts: material', 'posts', (p) => materialName(p.materialId)),
  input('Posts: size', 'posts', (p) => sizeName(p.materialId, p.sizeId)),
  input('Posts: height', 'posts', (p) => ftText(p.heightFt)),
  input('Posts: soil bearing under the pad', 'posts', (p) => psfText(p.soilBearingPsf)),
  input('Posts: pad thickness', 'posts', (p) => inText(p.padThicknessIn)),
];

const snowFields: Field<SnapshotMember>[] = [
  input('Roof snow: ground snow', 'snow', (s) => psfText(s.groundSnowPsf)),
  input('Roof snow: exposure factor Ce', 'snow', (s) => numberText(s.exposureCe)),
  input('Roof snow: thermal condition', 'snow', (s) => idText(s.thermalCondition)),
  input('Roof snow: risk category', 'snow', (s) => s.riskCategory),
  ['Roof snow: design load', (m) => psfText(m.result.snow?.designPsf)],
];

const loadingFields: Field<SnapshotMember>[] = [
  input('Load standard', 'edition', (v) => v),
  input('Roof slope', 'roofPitchIn12', (v) => numberText(v, 'in 12')),
  ...snowFields,
  input('Member’s own weight', 'selfWeight', (v) => yesNo(v, 'Included', 'Left out')),
];

const materialFields: Field<SnapshotMember>[] = [
  ['Material', (m) => m.summary.materialLabel],
  ['Size', (m) => m.summary.sizeLabel],
  input('Plies', 'plies', (v) => String(v)),
  input('Grade stamp', 'gradeUnknown', (v) => (v ? 'Not readable: weakest grade used' : 'Read')),
  input('Measured size of one ply', 'measuredPly', (p) => `${inText(p.bIn)} × ${inText(p.dIn)}`),
  input('Wet service', 'wetService', (v) => yesNo(v)),
  input('Service temperature', 'temperatureF', (v) => `${numberText(v)} °F`),
  input('Repetitive member', 'repetitive', (v) => yesNo(v)),
  input('Laid flat', 'flatUse', (v) => yesNo(v)),
  input('Incised', 'incised', (v) => yesNo(v)),
];

const limitFields: Field<SnapshotMember>[] = [
  input('Deflection limits', 'deflectionUse', (v) => DEFLECTION_WORDS[v]),
  input('Deflection cap', 'deflectionCapIn', inText),
  input('Sustained part of the live load', 'sustainedLiveFraction', (v) => `${numberText(v * 100)}%`),
  input('Shear at d from the supports', 'shearAtD', (v) => yesNo(v)),
];

const ratio = (value: number) => numberText(Math.round(value * 100) / 100);

const resultFields: Field<SnapshotMember>[] = [
  ['State', (m) => STATE_WORDS[m.summary.state]],
  ['Governing check', (m) => `${m.summary.governingCheck} at ${ratio(m.summary.governingRatio)}`],
  ['Largest reaction, left end', (m) => lbText(m.result.reactions.leftLb)],
  ['Largest reaction, right end', (m) => lbText(m.result.reactions.rightLb)],
  ['Bearing length needed', (m) => inText(m.result.bearing.requiredLengthIn)],
  ['Jack studs each end', (m) => String(m.result.bearing.jackStuds)],
  ['Hangers', (m) => (m.result.mount.hangers === null ? null : String(m.result.mount.hangers))],
  ['Warnings', (m) => String(m.summary.warningsCount)],
];

/** Every check's ratio, by the check's own label ("Bending: 0.87 (passes)"). */
function checkFields(members: (SnapshotMember | null)[]): Field<SnapshotMember>[] {
  const labels = new Map<string, string>();
  for (const m of members) for (const c of m?.result.checks ?? []) labels.set(c.id, c.label);
  return [...labels].map(([id, label]) => [
    label,
    (m) => {
      const check = m.result.checks.find((c) => c.id === id);
      return check ? `${ratio(check.ratio)} (${check.pass ? 'passes' : 'fails'})` : null;
    },
  ]);
}

/** Load sources keyed by kind, label and their order among those: an added floor load does not shift the roof's. */
function keyedLoads(member: SnapshotMember | null): Map<string, { source: LoadSource; n: number }> {
  const out = new Map<string, { source: LoadSource; n: number }>();
  const seen = new Map<string, number>();
  for (const source of member?.input.sources ?? []) {
    const base = `${source.kind}:${source.label ?? ''}`;
    const n = (seen.get(base) ?? 0) + 1;
    seen.set(base, n);
    out.set(`${base}#${n}`, { source, n });
  }
  return out;
}

export type MemberSectionId = 'span' | 'loads' | 'material' | 'limits' | 'result';

/** What changed in one member, by section; either side may be null (the member was added or removed). */
export function memberSections(
  before: SnapshotMember | null,
  after: SnapshotMember | null,
): Record<MemberSectionId, DiffLine[]> {
  const loads = compareKeyed(
    keyedLoads(before),
    keyedLoads(after),
    ({ source, n }) => loadName(source, n),
    ({ source }) => describeLoad(source),
    loadFields,
  );
  return {
    span: compareFields(spanFields, before, after),
    loads: [...compareFields(loadingFields, before, after), ...loads],
    material: compareFields(materialFields, before, after),
    limits: compareFields(limitFields, before, after),
    result: compareFields([...resultFields, ...checkFields([before, after])], before, after),
  };
}
