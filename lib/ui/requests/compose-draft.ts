import { fieldErrors } from '@/shared/errors';
import {
  heavyItems,
  mountChoices,
  requestComposeSchema,
  usStates,
  type RequestCompose,
} from '@/shared/schemas/requests/compose';

type HeavyItem = (typeof heavyItems)[number];
type DamageMark = 'sistered' | 'notched' | 'bored' | 'rot';

export const HEAVY_ITEM_LABELS: Record<HeavyItem, string> = {
  solar: 'Solar panels on the roof',
  'air-handler': 'An air handler or furnace in the attic',
  'water-heater': 'A water heater in the attic',
  'cast-iron-tub': 'A cast-iron tub on the floor above',
  other: 'Something else (say what below)',
};

export const DAMAGE_LABELS: Record<DamageMark, string> = {
  sistered: 'Sistered joists',
  notched: 'Notched joists',
  bored: 'Bored joists (holes through them)',
  rot: 'Rot or insect damage',
};

/** Text fields of the form, named by their path in the request body. */
export const textFields = [
  'engineerEmail',
  'jurisdiction.place',
  'conditions.framingDirection',
  'conditions.bearingPoints',
  'conditions.foundation',
  'conditions.whatIsAbove',
  'constraints.maxDepthIn',
  'constraints.postsMayGo',
  'constraints.longestPieceFt',
  'constraints.heaviestPieceLb',
  'phoneBack.joists.size',
  'phoneBack.joists.spacingIn',
  'phoneBack.joists.species',
  'phoneBack.roofingLayers',
  'phoneBack.heavyAboveNote',
  'phoneBack.sag.sagIn',
  'phoneBack.damage.note',
  'phoneBack.below.girder',
  'phoneBack.below.columns',
  'phoneBack.below.footings',
  'phoneBack.ductsOrPipes',
  'questions',
] as const;
export type TextField = (typeof textFields)[number];

/** What the compose form holds while it is typed: text as typed, choices as chosen. */
export type ComposeDraft = {
  memberIds: string[];
  text: Record<TextField, string>;
  state: (typeof usStates)[number] | '';
  mount: (typeof mountChoices)[number];
  heavyAbove: HeavyItem[];
  damage: Record<DamageMark, boolean>;
  tapeInPhoto: boolean;
  joistsFlag: RequestCompose['phoneBack']['joists']['flag'];
  yardStock: { product: string; eGrade: string }[];
};

const numberText = (n: number | null) => (n === null ? '' : String(n));

/** The form's draft from a request's working copy (an empty request for a new one). */
export function draftFromCompose(c: RequestCompose = requestComposeSchema.parse({})): ComposeDraft {
  const p = c.phoneBack;
  return {
    memberIds: [...c.memberIds],
    text: {
      engineerEmail: c.engineerEmail ?? '',
      'jurisdiction.place': c.jurisdiction.place,
      'conditions.framingDirection': c.conditions.framingDirection,
      'conditions.bearingPoints': c.conditions.bearingPoints,
      'conditions.foundation': c.conditions.foundation,
      'conditions.whatIsAbove': c.conditions.whatIsAbove,
      'constraints.maxDepthIn': numberText(c.constraints.maxDepthIn),
      'constraints.postsMayGo': c.constraints.postsMayGo,
      'constraints.longestPieceFt': numberText(c.constraints.longestPieceFt),
      'constraints.heaviestPieceLb': numberText(c.constraints.heaviestPieceLb),
      'phoneBack.joists.size': p.joists.size,
      'phoneBack.joists.spacingIn': numberText(p.joists.spacingIn),
      'phoneBack.joists.species': p.joists.species,
      'phoneBack.roofingLayers': numberText(p.roofingLayers),
      'phoneBack.heavyAboveNote': p.heavyAboveNote,
      'phoneBack.sag.sagIn': numberText(p.sag.sagIn),
      'phoneBack.damage.note': p.damage.note,
      'phoneBack.below.girder': p.below.girder,
      'phoneBack.below.columns': p.below.columns,
      'phoneBack.below.footings': p.below.footings,
      'phoneBack.ductsOrPipes': p.ductsOrPipes,
      questions: c.questions,
    },
    state: c.jurisdiction.state ?? '',
    mount: c.constraints.mount,
    heavyAbove: [...p.heavyAbove],
    damage: {
      sistered: p.damage.sistered,
      notched: p.damage.notched,
      bored: p.damage.bored,
      rot: p.damage.rot,
    },
    tapeInPhoto: p.joists.tapeInPhoto,
    joistsFlag: p.joists.flag,
    yardStock: p.yardStock.map((y) => ({ ...y })),
  };
}

export type ComposeReading =
  { ok: true; body: RequestCompose } | { ok: false; errors: Record<string, string[]> };

/**
 * Reads the form: numbers must read as numbers, a yard product needs its name, then the shared schema
 * checks the whole body. Errors are keyed by the body's paths, as the server's are.
 */
export function readComposeDraft(draft: ComposeDraft): ComposeReading {
  const errors: Record<string, string[]> = {};
  const t = draft.text;
  const num = (field: TextField): number | null => {
    const text = t[field].trim().replace(',', '.');
    if (text === '') return null;
    const value = Number(text);
    if (!Number.isFinite(value)) {
      errors[field] = ['Enter a number, like 16 or 9.5'];
      return null;
    }
    return value;
  };
  const yardStock = draft.yardStock
    .map((y) => ({ product: y.product.trim(), eGrade: y.eGrade.trim() }))
    .filter((y, i) => {
      if (y.product === '' && y.eGrade !== '') {
        errors[`phoneBack.yardStock.${i}.product`] = ['Name the product, like "1-3/4 in LVL"'];
      }
      return y.product !== '' || y.eGrade !== '';
    });
  const body = {
    memberIds: draft.memberIds,
    engineerEmail: t.engineerEmail.trim() === '' ? null : t.engineerEmail.trim(),
    jurisdiction: { place: t['jurisdiction.place'], state: draft.state === '' ? null : draft.state },
    conditions: {
      framingDirection: t['conditions.framingDirection'],
      bearingPoints: t['conditions.bearingPoints'],
      foundation: t['conditions.foundation'],
      whatIsAbove: t['conditions.whatIsAbove'],
    },
    constraints: {
      mount: draft.mount,
      maxDepthIn: num('constraints.maxDepthIn'),
      postsMayGo: t['constraints.postsMayGo'],
      longestPieceFt: num('constraints.longestPieceFt'),
      heaviestPieceLb: num('constraints.heaviestPieceLb'),
    },
    phoneBack: {
      joists: {
        size: t['phoneBack.joists.size'],
        spacingIn: num('phoneBack.joists.spacingIn'),
        species: t['phoneBack.joists.species'],
        tapeInPhoto: draft.tapeInPhoto,
        // A size typed in the form was measured by the person typing it; otherwise the stored flag stands.
        flag: t['phoneBack.joists.size'].trim() !== '' ? ('measured' as const) : draft.joistsFlag,
      },
      roofingLayers: num('phoneBack.roofingLayers'),
      heavyAbove: draft.heavyAbove,
      heavyAboveNote: t['phoneBack.heavyAboveNote'],
      sag: { sagIn: num('phoneBack.sag.sagIn'), stringLine: t['phoneBack.sag.sagIn'].trim() !== '' },
      damage: { ...draft.damage, note: t['phoneBack.damage.note'] },
      below: {
        girder: t['phoneBack.below.girder'],
        columns: t['phoneBack.below.columns'],
        footings: t['phoneBack.below.footings'],
      },
      yardStock,
      ductsOrPipes: t['phoneBack.ductsOrPipes'],
    },
    questions: t.questions,
  };
  const parsed = requestComposeSchema.safeParse(body);
  const schemaErrors = parsed.success ? {} : fieldErrors(parsed.error);
  for (const [path, messages] of Object.entries(schemaErrors)) errors[path] ??= messages;
  if (Object.keys(errors).length > 0 || !parsed.success) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}
