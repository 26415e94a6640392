import type { LoadPathElementData } from '@/shared/schemas/calc/load-path';
import type { LoadStandard } from '@/shared/schemas/jobs';

/** What the existing-framing form holds, as typed (numbers as text). */
export interface ElementDraft {
  kind: Exclude<LoadPathElementData['kind'], 'member'>;
  label: string;
  materialId: string;
  sizeId: string;
  heightFt: string;
  jackStuds: string;
  gradeUnknown: boolean;
  /** Beams: clear span, second span over a post (two spans), what floor it carries, bearing lengths. */
  spanFt: string;
  secondSpanFt: string;
  centreBearingIn: string;
  bearingIn: string;
  floorTributaryFt: string;
  measuredWidthIn: string;
  measuredDepthIn: string;
  ratedCapacityLb: string;
  pierMaterial: 'concrete' | 'concrete-block' | 'brick' | 'rubble';
  footing: 'existing' | 'new-pad';
  footingWidthIn: string;
  footingLengthIn: string;
  confirmed: boolean;
}

const DFL2 = 'sawn-douglas-fir-larch-no2';
const SPF = 'sawn-spruce-pine-fir-no1-no2';

/** A new draft of `kind` with the usual values filled in (common practice; every one can be changed). */
export function newDraft(kind: ElementDraft['kind']): ElementDraft {
  return {
    kind,
    label: '',
    materialId: kind === 'wall' ? SPF : DFL2,
    sizeId: kind === 'wall' ? '2x4' : kind === 'post' ? '6x6' : kind === 'joist' ? '2x10' : '3-ply-2x10',
    heightFt: kind === 'wall' ? '8' : '7',
    jackStuds: '2',
    gradeUnknown: true,
    spanFt: '',
    secondSpanFt: '',
    centreBearingIn: '5.5',
    bearingIn: '4',
    floorTributaryFt: kind === 'joist' ? '1.33' : '4',
    measuredWidthIn: '',
    measuredDepthIn: '',
    ratedCapacityLb: '',
    pierMaterial: 'concrete',
    footing: 'new-pad',
    footingWidthIn: '',
    footingLengthIn: '',
    confirmed: false,
  };
}

/** Text → number; blank is "not given" (the server names a required field that is missing). */
const num = (text: string): number | undefined => {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : undefined;
};

/** The element data the server checks, from the draft (the server's schema decides what is valid). */
export function elementFromDraft(d: ElementDraft, edition: LoadStandard): LoadPathElementData {
  const flags = d.gradeUnknown ? { gradeUnknown: true } : {};
  switch (d.kind) {
    case 'girder':
    case 'joist': {
      const width = num(d.measuredWidthIn);
      const depth = num(d.measuredDepthIn);
      const second = num(d.secondSpanFt);
      return {
        kind: d.kind,
        input: {
          kind: 'beam',
          edition,
          clearSpanFt: num(d.spanFt) as number,
          bearingLeftIn: num(d.bearingIn),
          bearingRightIn: num(d.bearingIn),
          ...(second !== undefined
            ? { secondClearSpanFt: second, centreBearingIn: num(d.centreBearingIn) }
            : {}),
          sources: [
            {
              kind: 'floor',
              label: 'Floor it carries',
              tributaryFt: num(d.floorTributaryFt) as number,
              deadPsf: 10,
              livePsf: 40,
            },
          ],
          materialId: d.materialId,
          sizeId: d.sizeId,
          ...flags,
          ...(width !== undefined && depth !== undefined ? { measuredPly: { bIn: width, dIn: depth } } : {}),
        },
      } as LoadPathElementData;
    }
    case 'wall':
      return {
        kind: 'wall',
        studMaterialId: d.materialId,
        studSizeId: d.sizeId,
        jackStuds: num(d.jackStuds) as number,
        heightFt: num(d.heightFt) as number,
        ...flags,
      };
    case 'post':
      return {
        kind: 'post',
        materialId: d.materialId,
        sizeId: d.sizeId,
        heightFt: num(d.heightFt) as number,
        ...flags,
      };
    case 'steel-column':
      return {
        kind: 'steel-column',
        heightFt: num(d.heightFt) as number,
        ratedCapacityLb: num(d.ratedCapacityLb),
      };
    case 'pier':
      return { kind: 'pier', material: d.pierMaterial, heightFt: num(d.heightFt) };
    case 'footing':
      return d.footing === 'new-pad'
        ? { kind: 'footing', data: { footing: 'new-pad', confirmed: d.confirmed } }
        : {
            kind: 'footing',
            data: {
              footing: 'existing',
              widthIn: num(d.footingWidthIn),
              lengthIn: num(d.footingLengthIn),
              confirmed: d.confirmed,
            },
          };
    case 'foundation-wall':
      return { kind: 'foundation-wall', confirmed: d.confirmed };
    case 'slab':
      return { kind: 'slab' };
  }
}

/** The draft of a saved element, to change it. */
export function draftFromElement(label: string, e: LoadPathElementData): ElementDraft {
  const d = newDraft(e.kind === 'member' ? 'girder' : e.kind);
  d.label = label;
  const text = (n: number | undefined) => (n === undefined ? '' : String(n));
  if (e.kind === 'girder' || e.kind === 'joist') {
    const floor = e.input.sources.find((s) => s.kind === 'floor');
    return {
      ...d,
      materialId: e.input.materialId,
      sizeId: e.input.sizeId,
      gradeUnknown: Boolean(e.input.gradeUnknown),
      spanFt: text(e.input.clearSpanFt),
      secondSpanFt: text(e.input.secondClearSpanFt),
      centreBearingIn: text(e.input.centreBearingIn ?? 5.5),
      bearingIn: text(e.input.bearingLeftIn ?? 3),
      floorTributaryFt: floor && 'tributaryFt' in floor ? text(floor.tributaryFt) : d.floorTributaryFt,
      measuredWidthIn: text(e.input.measuredPly?.bIn),
      measuredDepthIn: text(e.input.measuredPly?.dIn),
    };
  }
  if (e.kind === 'wall')
    return {
      ...d,
      materialId: e.studMaterialId,
      sizeId: e.studSizeId,
      jackStuds: text(e.jackStuds),
      heightFt: text(e.heightFt),
      gradeUnknown: Boolean(e.gradeUnknown),
    };
  if (e.kind === 'post')
    return {
      ...d,
      materialId: e.materialId,
      sizeId: e.sizeId,
      heightFt: text(e.heightFt),
      gradeUnknown: Boolean(e.gradeUnknown),
    };
  if (e.kind === 'steel-column')
    return { ...d, heightFt: text(e.heightFt), ratedCapacityLb: text(e.ratedCapacityLb) };
  if (e.kind === 'pier') return { ...d, pierMaterial: e.material, heightFt: text(e.heightFt) };
  if (e.kind === 'footing')
    return {
      ...d,
      footing: e.data.footing,
      confirmed: e.data.confirmed,
      footingWidthIn: e.data.footing === 'existing' ? text(e.data.widthIn) : '',
      footingLengthIn: e.data.footing === 'existing' ? text(e.data.lengthIn) : '',
    };
  if (e.kind === 'foundation-wall') return { ...d, confirmed: e.confirmed };
  return d;
}
