import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { chipAt, type Box, type PlacedLabel } from './label-placement';
import { amountText, drawnMagnitude, groupLoads, type DrawnLoad } from './load-groups';
import { packArrows, packBands } from './load-rows';
import { spanScale } from './span-frame';
import { layoutSupports, type DimensionLine } from './support-layout';
import { chipWidth, fitText, LABEL_HEIGHT } from './text-metrics';

const ROW_GAP = 4;
const BAND_MIN = 5;
const BAND_MAX = 14;
/** A uniform-load row: label, the band hanging just under it, and clear space above the next row, px. */
const BAND_ROW = LABEL_HEIGHT + 2 + BAND_MAX + ROW_GAP * 2;
const POINT_ROW = LABEL_HEIGHT + ROW_GAP;
/** Least length of an arrow between its label and the loads below it, px. */
const ARROW_RUN = 14;
const TICK_SPACING = 14;

/** A uniform load's band (px), its down-ticks' x, and the load it draws (index into `loads`). */
export interface LoadBand extends Box {
  ticks: number[];
  loadIndex: number;
}

export interface LoadArrow {
  x: number;
  yTop: number;
  yBottom: number;
  loadIndex: number;
}

/** Everything needed to draw the loaded member (px, y downward). */
export interface LoadLayout {
  width: number;
  height: number;
  loads: DrawnLoad[];
  beam: Box;
  /** Every bearing, left to right, to scale along x. */
  bearings: Box[];
  bands: LoadBand[];
  arrows: LoadArrow[];
  /** Load labels, reaction and bearing chips. */
  labels: PlacedLabel[];
  dimensions: DimensionLine[];
  /** Ids of load labels drawn over another load's arrow because no clear place was left (normally none). */
  crossings: string[];
}

/** Widest a load label is drawn, px: a long name is shortened before it takes a whole row. */
const LOAD_LABEL_MAX = 240;
/** Width of the middle variant of a load label, px: the name cut short for a tight place. */
const LOAD_LABEL_SHORT = 150;

/**
 * A load's label variants, longest first: the full one with its name shortened so the amount stays whole
 * ("Floor · D+L 624 plf"), the name cut shorter for a tight place, and the amount alone ("D+L 624 plf").
 */
function loadTexts(load: DrawnLoad, widthPx: number): string[] {
  const amount = amountText(load);
  const tail = ` · ${amount}`;
  const named = (maxPx: number) => `${fitText(load.label, maxPx - chipWidth(tail) + chipWidth(''))}${tail}`;
  const full = named(Math.min(widthPx, LOAD_LABEL_MAX));
  const short = named(Math.min(widthPx, LOAD_LABEL_SHORT));
  return [...new Set([full, short, amount])];
}

function ticksBetween(left: number, right: number): number[] {
  const count = Math.max(1, Math.floor((right - left) / TICK_SPACING));
  const step = (right - left) / count;
  return Array.from({ length: count }, (_, i) => left + step * (i + 0.5));
}

/**
 * Lays out the loaded member for a given width: to scale along x over the whole piece, every span and
 * overhang (takedown positions are in the analysis frame, see span-frame), uniform loads as bands stacked in rows so that partial loads share a row where
 * they and their labels fit, band height growing with the load; point loads as arrows with their labels
 * above the bands; the beam, every bearing to scale, the largest reactions, and dimension lines for each
 * clear span (support faces), overhang and design span (bearing centres). Loads are the service (unfactored)
 * loads of the takedown, one per source: "Floor · D+L 624 plf".
 *
 * @param result a member check result (the takedown, spans and reactions; samples are not needed)
 * @param widthPx drawing width, px
 * @example layoutLoads(checkMember(input), 390).labels.map((l) => l.text)
 */
export function layoutLoads(result: MemberCheckResult, widthPx: number): LoadLayout {
  const scale = spanScale(result, widthPx);
  const loads = groupLoads(result.takedown, scale.frame.analysedLengthFt);
  const uniformIdx = loads.flatMap((l, i) => (l.kind === 'uniform' ? [i] : []));
  const pointIdx = loads.flatMap((l, i) => (l.kind === 'point' ? [i] : []));
  const texts = loads.map((l) => loadTexts(l, widthPx));
  const pointXs = pointIdx.map((i) => {
    const load = loads[i];
    return scale.px(load.kind === 'point' ? load.atFt : 0);
  });
  const bandXs = uniformIdx.map((i) => {
    const load = loads[i];
    return load.kind === 'uniform' ? [scale.px(load.startFt), scale.px(load.endFt)] : [0, 0];
  });
  const bandSpots = packBands(
    uniformIdx.map((i, k) => ({
      bandLeft: bandXs[k][0],
      bandRight: bandXs[k][1],
      labelWidths: texts[i].map(chipWidth),
    })),
    pointXs,
    widthPx,
  );
  const pointSpots = packArrows(
    pointIdx.map((i, k) => ({ x: pointXs[k], labelWidths: texts[i].map(chipWidth) })),
    widthPx,
  );
  const pointRows = pointSpots.reduce((m, s) => Math.max(m, s.row + 1), 0);
  const bandRows = bandSpots.reduce((m, s) => Math.max(m, s.row + 1), 0);
  const pointsBottom = pointRows * POINT_ROW;
  const beamTop = pointsBottom + (pointRows > 0 ? ARROW_RUN : 0) + bandRows * BAND_ROW;

  const labels: PlacedLabel[] = [];
  const crossings: string[] = [];
  const maxPlf = Math.max(1, ...uniformIdx.map((i) => drawnMagnitude(loads[i])));
  const bands: LoadBand[] = uniformIdx.map((i, k) => {
    const load = loads[i];
    const spot = bandSpots[k];
    const rowTop = beamTop - (spot.row + 1) * BAND_ROW + ROW_GAP;
    const height = BAND_MIN + ((BAND_MAX - BAND_MIN) * drawnMagnitude(load)) / maxPlf;
    const [left, right] = bandXs[k];
    labels.push(chipAt(`load-${i}`, texts[i][spot.variant], spot.labelX, rowTop, (left + right) / 2));
    if (spot.crossesArrow) crossings.push(`load-${i}`);
    const bandTop = rowTop + LABEL_HEIGHT + 2;
    return {
      x: left,
      y: bandTop,
      width: right - left,
      height,
      ticks: ticksBetween(left, right),
      loadIndex: i,
    };
  });
  const arrows: LoadArrow[] = pointIdx.map((i, k) => {
    const spot = pointSpots[k];
    const y = pointsBottom - (spot.row + 1) * POINT_ROW;
    labels.push(chipAt(`load-${i}`, texts[i][spot.variant], spot.labelX, y, pointXs[k]));
    if (spot.crossesArrow) crossings.push(`load-${i}`);
    return { x: pointXs[k], yTop: y + LABEL_HEIGHT, yBottom: beamTop, loadIndex: i };
  });

  const below = layoutSupports(result, scale, beamTop);
  labels.push(...below.labels);
  return {
    width: widthPx,
    height: below.bottom,
    loads,
    beam: below.beam,
    bearings: below.bearings,
    bands,
    arrows,
    labels,
    dimensions: below.dimensions,
    crossings,
  };
}
