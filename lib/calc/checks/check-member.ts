import { blankStateLike, combineStates, sampleDiagram, spanModelFromState } from '@/lib/calc/analysis';
import { formatNumber } from '@/lib/format';
import { checkColumn, PRESUMPTIVE_SOIL_BEARING_PSF, sizeFootingPad } from '@/lib/calc/columns';
import { getMaterial, getSize, sizeIdentity } from '@/lib/calc/materials';
import { CAUTION_TEXT } from '@/lib/calc/prescriptive/caution';
import { LOAD_TYPES } from '@/lib/calc/types';
import type {
  CombinationDemands,
  MemberCheckInput,
  MemberCheckOptions,
  MemberCheckResult,
  MemberLoadingInput,
} from '@/shared/schemas/calc/member';
import { jackStuds } from './bearing-jacks';
import { combinationDemands, supportNames } from './combination-demands';
import { DEFLECTION_PRESETS } from './deflection-presets';
import { describeChecks } from './describe-checks';
import { echoInputs } from './echo-inputs';
import { evaluateSize, type SizeEvaluation, type SupportSpec } from './evaluate-size';
import { mountRequirements } from './mount-requirements';
import { prepareMember, type PreparedMember } from './prepare-member';
import { resolveMember } from './resolve-member';
import { sectionFactors, supportFcPerpPsi, type ServiceConditions } from './section-factors';

/** Plate under the jack studs when none is named: Spruce-Pine-Fir No.1/No.2 (common framing stock). */
export const DEFAULT_PLATE_MATERIAL_ID = 'sawn-spruce-pine-fir-no1-no2';
/** Support width when none is given: a 2x4 wall, 3-1/2 in (NDS Supplement Table 1B). */
export const DEFAULT_SUPPORT_WIDTH_IN = 3.5;
/** Footing pad thickness when none is given, in (common practice). */
export const DEFAULT_PAD_THICKNESS_IN = 12;
const DEFAULT_TEMPERATURE_F = 70;

/**
 * Service conditions of a member input, defaults filled.
 * @example serviceConditions(input).temperatureF; // 70 when not given
 * Reference: NDS 2018 §2.3.3 (temperature), §4.3.3 (wet service), §4.3.7–4.3.9.
 */
export function serviceConditions(
  input: Pick<MemberLoadingInput, 'wetService' | 'temperatureF' | 'incised' | 'flatUse' | 'repetitive'>,
): ServiceConditions {
  return {
    wetService: input.wetService ?? false,
    temperatureF: input.temperatureF ?? DEFAULT_TEMPERATURE_F,
    incised: input.incised ?? false,
    flatUse: input.flatUse ?? false,
    repetitive: input.repetitive ?? false,
  };
}

/**
 * The support under the member: jack studs on a plate (the plate's F'_c⊥ counts) or a post.
 * @param input member input (supportKind, supportWidthIn in, plateMaterialId)
 * @returns support width (in), plate F'_c⊥ (psi) and the plate's label
 * @example supportSpec(input).spec.widthIn; // 3.5 by default
 * Reference: NDS 2018 §3.10.
 */
export function supportSpec(
  input: Pick<
    MemberLoadingInput,
    | 'supportKind'
    | 'supportWidthIn'
    | 'plateMaterialId'
    | 'wetService'
    | 'temperatureF'
    | 'incised'
    | 'flatUse'
    | 'repetitive'
  >,
): { spec: SupportSpec; plateLabel: string | null } {
  const kind = input.supportKind ?? 'jacks';
  const widthIn = input.supportWidthIn ?? DEFAULT_SUPPORT_WIDTH_IN;
  if (kind === 'post') return { spec: { kind, widthIn, plateFcPerpPsi: null }, plateLabel: null };
  const plateId = input.plateMaterialId ?? DEFAULT_PLATE_MATERIAL_ID;
  const plateFcPerpPsi = supportFcPerpPsi(plateId, getSize(plateId, '2x4'), serviceConditions(input));
  return { spec: { kind, widthIn, plateFcPerpPsi }, plateLabel: getMaterial(plateId).label };
}

function baseSources(prepared: PreparedMember, materialSource: string): string[] {
  const preset = DEFLECTION_PRESETS[prepared.input.deflectionUse ?? 'floor'];
  return [
    'NDS 2018 §3.3 bending',
    'NDS 2018 §3.4 shear',
    'NDS 2018 §3.5 deflection (§3.5.2 creep)',
    'NDS 2018 §3.10 bearing',
    'NDS 2018 Table 2.3.2 load duration factors',
    'AWC Design Aid No. 6 beam formulas',
    `${materialSource} reference design values`,
    preset.source,
    ...prepared.sources,
  ];
}

function postsFor(prepared: PreparedMember, evaluation: SizeEvaluation): MemberCheckResult['posts'] {
  const posts = prepared.input.posts;
  if (!posts) return undefined;
  const ends = supportNames(prepared.geometry.supportsFt.length);
  const unitReactions = prepared.unitSelfWeight.reactionsLb;
  return ends.map((end, e) => {
    let best = { ratio: -1, pass: true, combination: '', loadLb: 0 };
    let maxLoadLb = 0;
    for (const prep of prepared.combinations) {
      if (prep.skipped) continue;
      const loadLb = Math.max(
        0,
        prep.state.reactionsLb[e] +
          (prep.combination.factors.D ?? 0) * evaluation.selfWeightPlf * unitReactions[e],
      );
      maxLoadLb = Math.max(maxLoadLb, loadLb);
      const check = checkColumn({
        materialId: posts.materialId,
        sizeId: posts.sizeId,
        heightFt: posts.heightFt,
        loadLb,
        CD: prep.combination.CD,
        weakAxisBraced: posts.weakAxisBraced,
        wet: prepared.input.wetService,
      });
      if (check.ratio > best.ratio)
        best = { ratio: check.ratio, pass: check.pass, combination: prep.combination.name, loadLb };
    }
    const soilBearingPsf = posts.soilBearingPsf ?? PRESUMPTIVE_SOIL_BEARING_PSF;
    const pad = sizeFootingPad({
      loadLb: Math.max(maxLoadLb, 1),
      soilBearingPsf,
      padThicknessIn: posts.padThicknessIn ?? DEFAULT_PAD_THICKNESS_IN,
    });
    return {
      end,
      loadLb: maxLoadLb,
      ratio: best.ratio,
      pass: best.pass,
      combination: best.combination,
      footingSideIn: pad.sideIn,
      footingAreaFt2: pad.providedAreaFt2,
      soilBearingPsf: pad.soilBearingPsf,
    };
  });
}

/** What the user should know about an overhanging or continuous member's model. */
function spanModelWarnings(prepared: PreparedMember, input: MemberCheckInput): string[] {
  if (prepared.geometry.simple) return [];
  const warnings: string[] = [];
  if (prepared.combinations.some((c) => c.loadedRegions !== null)) {
    warnings.push(
      'Variable loads are also placed span by span (ASCE 7 §4.3.3 partial loading; snow at half on the other spans, §7.5): a combination naming where its variable load is comes from that.',
    );
  }
  if (input.unbracedLengthFt === undefined) {
    warnings.push(
      'Over a centre post and along an overhang the bottom edge is in compression: brace it there (blocking, a ceiling fastened to it) or give the unbraced length.',
    );
  }
  if (input.secondClearSpanFt !== undefined) {
    warnings.push(
      'Continuous over the centre post: the member must be one piece (or spliced as an engineer designs) over it, and the post carries the largest reaction down to a footing.',
    );
  }
  return warnings;
}

/** Per support, the largest and least reaction of any combination with the combination that gives each. */
function reactionsBySupport(
  byCombination: readonly CombinationDemands[],
): NonNullable<MemberCheckResult['reactions']['bySupport']> {
  const first = byCombination[0];
  return first.reactions.map((r, i) => {
    let largest = { lb: r.lb, combination: first.combination };
    let least = largest;
    for (const d of byCombination) {
      const lb = d.reactions[i].lb;
      if (lb > largest.lb) largest = { lb, combination: d.combination };
      if (lb < least.lb) least = { lb, combination: d.combination };
    }
    return {
      support: r.support,
      atFt: r.atFt,
      largestLb: largest.lb,
      largestCombination: largest.combination,
      leastLb: least.lb,
      leastCombination: least.combination,
    };
  });
}

/**
 * Preliminary check of a header or beam (NDS ASD): loads to per-foot loads by type, the job edition's ASD
 * combinations (combinations naming a load type that carries nothing are skipped, another always governs
 * them), and per combination bending, shear, deflection (live against the use's limit, total with creep
 * against the total limit and any cap) and bearing on the member and the plate → jack studs; flush or
 * dropped requirements; posts and footing pads when asked. Every check lists the factors it used; C_D never
 * touches F_c⊥ or E.
 *
 * Creep (NDS 3.5.2): the sustained load is the dead load, self-weight and `sustainedLiveFraction` of the
 * occupancy live load (default 0 — residential live load is mostly transient; enter a part for storage or
 * heavy furniture). Roof live and snow are taken as short-term.
 *
 * @param input parsed memberCheckInputSchema (ft, in, psf, plf, lb)
 * @param options diagrams: sample V, M, y of the governing combination
 * The result also carries the demands of every combination and of the governing one (reactions, M_max,
 * V_max and the design shear, deflections with positions; see combinationDemands), the largest and least
 * reaction at each support with its combination, and the jack studs bearing needs beside what common
 * practice adds.
 *
 * @returns the result (stresses psi, deflections and bearing lengths in, loads lb)
 * @throws CalcInputError naming the input field for anything the engine cannot check
 * @example checkMember(memberCheckInputSchema.parse({ kind: 'header', edition: 'ASCE 7-22', clearSpanFt: 6, sources: [...], materialId: 'sawn-douglas-fir-larch-no2', sizeId: '2-ply-2x10' })).governing;
 * Reference: NDS 2018 §§3.3–3.5, 3.10, Tables 2.3.2, 4.3.1, 5.3.1, 8.3.1; ASCE 7-16/7-22 §2.4.1.
 */
export function checkMember(input: MemberCheckInput, options: MemberCheckOptions = {}): MemberCheckResult {
  const resolved = resolveMember(input);
  const { material, size } = resolved;
  const prepared = prepareMember(input);
  const section = sectionFactors(
    material.id,
    size,
    prepared.geometry.longestSpanFt,
    serviceConditions(input),
  );
  const support = supportSpec(input);
  const evaluation = evaluateSize(prepared, section, size.selfWeightPlf, support.spec);
  const checks = describeChecks(prepared, section, evaluation);
  const jacks = jackStuds(evaluation.bearing.requiredLengthIn, input.clearSpanFt);
  const mount = mountRequirements(input, section.dIn, size.plies, evaluation.bearing.requiredLengthIn);
  const warnings = [...resolved.warnings, ...prepared.warnings];
  if (material.generic) warnings.push("Generic values: confirm with the manufacturer's published values.");
  if (input.deflectionUse === 'roof-no-ceiling' && (input.roofPitchIn12 ?? 0) <= 3) {
    warnings.push(
      'L/180 for a roof without a ceiling is for rafters sloped over 3 in 12 (IRC Table R301.7); a flatter roof takes L/240: choose the roof preset.',
    );
  }
  if (input.unbracedLengthFt === undefined) {
    warnings.push(
      'Top edge taken as braced by the framing along its length (C_L = 1.0); say so if it is not.',
    );
  }
  const takedown = [...prepared.takedown];
  if (prepared.selfWeight) {
    takedown.push({
      label: 'Self-weight',
      type: 'D',
      expression: `${size.label}: ${evaluation.selfWeightPlf.toFixed(1)} plf`,
      wPlf: evaluation.selfWeightPlf,
    });
  }
  const unitReactions = prepared.unitSelfWeight.reactionsLb;
  const last = unitReactions.length - 1;
  const byType = {} as MemberCheckResult['reactions']['byType'];
  for (const t of LOAD_TYPES) {
    const r = prepared.reactionsByType[t];
    const sw = t === 'D' ? evaluation.selfWeightPlf : 0;
    byType[t] = { leftLb: r[0] + sw * unitReactions[0], rightLb: r[last] + sw * unitReactions[last] };
    if (last === 2) byType[t].centreLb = r[1] + sw * unitReactions[1];
  }
  warnings.push(...spanModelWarnings(prepared, input));
  const governingCheck = checks.find((c) => c.id === evaluation.governing.id) ?? checks[0];
  const byCombination = combinationDemands(
    prepared,
    evaluation.selfWeightPlf,
    evaluation.eiLbIn2,
    section.dIn,
  );
  const governingDemands =
    byCombination.find((d) => d.combination === governingCheck.combination) ?? byCombination[0];
  const bySupport = reactionsBySupport(byCombination);
  for (const r of bySupport) {
    if (r.leastLb < 0) {
      warnings.push(
        `Uplift at the ${r.support} support: up to ${formatNumber(-r.leastLb, 0)} lb (${r.leastCombination}). Hold the member down there (a strap or hold-down to framing that can take it); the bearing check does not cover it.`,
      );
    }
  }
  const posts = postsFor(prepared, evaluation);
  if (posts?.some((p) => !p.pass)) {
    warnings.push('A post under the member fails its check: choose a larger post or brace it.');
  }
  const result: MemberCheckResult = {
    caution: CAUTION_TEXT,
    pass: checks.every((c) => c.pass) && mount.depthFits !== false && (posts?.every((p) => p.pass) ?? true),
    member: {
      kind: input.kind,
      label: input.label,
      ...sizeIdentity(material, size),
      selfWeightPlf: evaluation.selfWeightPlf,
    },
    spans: prepared.spans,
    inputs: echoInputs(input, prepared.spans, {
      materialLabel: material.label,
      sizeLabel: size.label,
      plateLabel: support.plateLabel,
      supportWidthIn: support.spec.widthIn,
      snowThermal: prepared.snow
        ? { condition: prepared.snow.thermalCondition, ct: prepared.snow.thermalCt }
        : undefined,
    }),
    ...(prepared.snow && {
      snow: {
        pfPsf: prepared.snow.pfPsf,
        psPsf: prepared.snow.psPsf,
        pmPsf: prepared.snow.pmPsf,
        designPsf: prepared.snow.designPsf,
        governing: prepared.snow.governing,
        thermalCondition: prepared.snow.thermalCondition,
        thermalCt: prepared.snow.thermalCt,
        thermalCtGiven: prepared.snow.thermalCtGiven,
        slipperyCurveUsed: prepared.snow.slipperyCurveUsed,
        factors: prepared.snow.factors,
        notes: prepared.snow.notes,
        reference: prepared.snow.reference,
      },
    }),
    takedown,
    combinations: prepared.combinations.map((c) => ({
      name: c.combination.name,
      CD: c.combination.CD,
      skipped: c.skipped,
    })),
    checks,
    governing: {
      check: governingCheck.id,
      combination: governingCheck.combination,
      ratio: governingCheck.ratio,
    },
    reactions: {
      leftLb: evaluation.bearing.leftLb,
      rightLb: evaluation.bearing.rightLb,
      combination: prepared.combinations[evaluation.bearing.combinationIndex].combination.name,
      byType,
      bySupport,
    },
    bearing: {
      requiredLengthIn: evaluation.bearing.requiredLengthIn,
      providedLengthIn: Math.min(prepared.spans.bearingLeftIn, prepared.spans.bearingRightIn),
      jackStuds: jacks.count,
      jackStudsNote: jacks.note,
      jackStudsForBearing: jacks.forBearing,
      jackStudsAddedByPractice: jacks.addedByPractice,
      governedBy: evaluation.bearing.governedBy,
    },
    mount,
    posts,
    warnings,
    sources: baseSources(prepared, material.source),
    demands: { governing: governingDemands, byCombination },
  };
  if (options.diagrams) {
    const index = prepared.combinations.findIndex((c) => c.combination.name === governingCheck.combination);
    const prep = prepared.combinations[Math.max(0, index)];
    const state = combineStates(
      blankStateLike(prep.state),
      [prep.state, prepared.unitSelfWeight],
      [1, (prep.combination.factors.D ?? 0) * evaluation.selfWeightPlf],
    );
    result.diagram = {
      combination: prep.combination.name,
      samples: sampleDiagram(spanModelFromState(state, evaluation.eiLbIn2), options.diagramPoints ?? 41),
    };
  }
  return result;
}
