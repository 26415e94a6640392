import type { ChainStep } from '@/lib/calc/load-path';
import {
  groundElementKinds,
  type LoadPathEnd,
  type LoadPathElementKind,
  type LoadPathState,
} from '@/shared/schemas/calc/load-path';
import { kindWords, lbText, pathStateLook } from './words';

/** Sizes of the section drawing, px (screen) or pt (PDF): one unit either way. */
export const drawingSizes = {
  pad: 4,
  gapX: 8,
  gapY: 46,
  /** Width of one lane at a side for a line that passes levels it does not stop at. */
  lane: 14,
  inset: 8,
  titleSize: 13,
  textSize: 12,
  lineStep: 16,
  chipH: 18,
  /** How far above a level a skipping line runs across: clear of the chips (gapY / 2 ± chipH / 2) above it. */
  runClear: 10,
} as const;

/** Where along its box each end leaves from, as a share of the box's width. */
const endAlong: Record<string, number> = { left: 0.25, right: 0.75 };

/** What the drawing needs of a step: the engine's chain and the request snapshot both give it. */
export interface DrawingStep {
  id: string;
  label: string;
  kind: LoadPathElementKind;
  state: LoadPathState;
  depth: number;
  ends: { end: LoadPathEnd; ontoId?: string; governingLb: number }[];
}

/** The engine's chain (chainBelow) as drawing steps. */
export function fromChain(steps: readonly ChainStep[]): DrawingStep[] {
  return steps.map(({ element: e, depth }) => ({
    id: e.id,
    label: e.label,
    kind: e.kind as LoadPathElementKind,
    state: e.state,
    depth,
    ends: e.ends.map((end) => ({
      end: end.end,
      ontoId: end.ontoId ?? undefined,
      governingLb: end.governingLb,
    })),
  }));
}

/** Width of a text at a size, in the drawing's units. */
export type Measure = (text: string, size: number) => number;

/**
 * A safe estimate of the width of Inter (bold or regular) text: 0.62 em a glyph, wider than Inter's average,
 * so an estimated line is never longer than the real one (common practice for layout without a font).
 */
export const estimateWidth: Measure = (text, size) => text.length * size * 0.62;

export interface DrawingText {
  text: string;
  x: number;
  y: number;
  size: number;
  strong: boolean;
  tone: 'ink' | 'muted' | 'danger';
  anchor: 'start' | 'middle';
}

export interface DrawingBox {
  id: string;
  depth: number;
  x: number;
  y: number;
  w: number;
  h: number;
  danger: boolean;
  ground: boolean;
}

export interface DrawingLink {
  fromId: string;
  /** Undefined when the end does not yet say what it bears on (drawn dashed, "→ ?"). */
  toId?: string;
  /** The levels the line runs across: from the level of its element to the level it lands on. */
  fromDepth: number;
  toDepth: number;
  points: { x: number; y: number }[];
  chip: { x: number; y: number; w: number; h: number };
  label: DrawingText;
}

export interface DrawingLayout {
  width: number;
  height: number;
  boxes: DrawingBox[];
  links: DrawingLink[];
  texts: DrawingText[];
}

/**
 * A text cut into lines of whole words no wider than maxWidth (a single word wider than that is split,
 * the only case a word is broken).
 * @example wrapWords('Basement girder under the kitchen', 90, 12) // ['Basement', 'girder under', 'the kitchen']
 */
export function wrapWords(text: string, maxWidth: number, size: number, measure: Measure = estimateWidth) {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (measure(next, size) <= maxWidth) {
      line = next;
      continue;
    }
    if (line) lines.push(line);
    let rest = word;
    while (measure(rest, size) > maxWidth && rest.length > 1) {
      let n = rest.length - 1;
      while (n > 1 && measure(rest.slice(0, n), size) > maxWidth) n--;
      lines.push(rest.slice(0, n));
      rest = rest.slice(n);
    }
    line = rest;
  }
  if (line) lines.push(line);
  return lines;
}

interface BoxText {
  text: string;
  size: number;
  strong: boolean;
  tone: DrawingText['tone'];
}

function boxTexts(e: DrawingStep): BoxText[] {
  const look = pathStateLook[e.state];
  const danger = look.tone === 'danger';
  return [
    { text: e.label, size: drawingSizes.titleSize, strong: true, tone: 'ink' },
    {
      text: kindWords[e.kind as LoadPathElementKind],
      size: drawingSizes.textSize,
      strong: false,
      tone: 'muted',
    },
    {
      text: `${look.icon === 'check' ? '✓' : '!'} ${look.word}`,
      size: drawingSizes.textSize,
      strong: true,
      tone: danger ? 'danger' : 'ink',
    },
  ];
}

/**
 * The section of a load path, laid out for a width: one row of boxes per level (from the member at the top
 * down to the ground), each box's words wrapped to whole words inside it, and a line from each end down
 * to what it bears on with the load on a chip. A line that passes a level without stopping runs down a
 * lane at the nearer side, so it never crosses a box or a chip. Screen (react-native-svg) and PDF (pdf-lib)
 * draw only this.
 * @param steps the chain (fromChain(chainBelow(…)) on screen, the snapshot's steps in the PDF)
 * @param width the drawing's width
 * @param measure the width of a text (the PDF passes its embedded font's; the screen the estimate)
 * @example drawingLayout(fromChain(chainBelow(result, 'beam')), 390).boxes.length // one per step
 */
export function drawingLayout(
  steps: readonly DrawingStep[],
  width: number,
  measure: Measure = estimateWidth,
): DrawingLayout {
  const s = drawingSizes;
  const depthOf = new Map(steps.map((st) => [st.id, st.depth]));
  const rows = new Map<number, DrawingStep[]>();
  for (const st of steps) rows.set(st.depth, [...(rows.get(st.depth) ?? []), st]);
  // A line that skips a level runs down a lane at the side nearer the end it leaves from.
  const laneOf = new Map<string, { side: 'left' | 'right'; index: number }>();
  const laneCount = { left: 0, right: 0 };
  for (const st of steps) {
    const row = rows.get(st.depth) as DrawingStep[];
    for (const end of st.ends) {
      if (!end.ontoId || (depthOf.get(end.ontoId) ?? st.depth + 1) <= st.depth + 1) continue;
      const along = (row.indexOf(st) + (endAlong[end.end] ?? 0.5)) / row.length;
      const side = along < 0.5 ? 'left' : 'right';
      laneOf.set(`${st.id}-${end.end}`, { side, index: laneCount[side]++ });
    }
  }
  const left = s.pad + laneCount.left * s.lane;
  const inner = Math.max(40, width - 2 * s.pad - (laneCount.left + laneCount.right) * s.lane);

  const boxes: DrawingBox[] = [];
  const texts: DrawingText[] = [];
  const byId = new Map<string, DrawingBox>();
  let y = s.pad;
  for (const depth of [...rows.keys()].sort((a, b) => a - b)) {
    const row = rows.get(depth) as DrawingStep[];
    const w = (inner - s.gapX * (row.length - 1)) / row.length;
    const wrapped = row.map((st) =>
      boxTexts(st).map((t) => ({ ...t, lines: wrapWords(t.text, w - 2 * s.inset, t.size, measure) })),
    );
    const lineCount = Math.max(...wrapped.map((parts) => parts.reduce((n, p) => n + p.lines.length, 0)));
    const h = lineCount * s.lineStep + 2 * s.inset + 4;
    row.forEach((st, i) => {
      const e = st;
      const box: DrawingBox = {
        id: e.id,
        depth,
        x: left + i * (w + s.gapX),
        y,
        w,
        h,
        danger: pathStateLook[e.state].tone === 'danger',
        ground: (groundElementKinds as readonly string[]).includes(e.kind),
      };
      boxes.push(box);
      byId.set(e.id, box);
      let ty = y + s.inset + s.titleSize;
      for (const part of wrapped[i]) {
        for (const text of part.lines) {
          texts.push({
            text,
            x: box.x + s.inset,
            y: ty,
            size: part.size,
            strong: part.strong,
            tone: part.tone,
            anchor: 'start',
          });
          ty += s.lineStep;
        }
      }
    });
    y += h + s.gapY;
  }

  const links: DrawingLink[] = steps.flatMap((st) =>
    st.ends.map((end): DrawingLink => {
      const from = byId.get(st.id) as DrawingBox;
      const to = end.ontoId ? byId.get(end.ontoId) : undefined;
      const x1 =
        from.x + from.w / 2 + (end.end === 'left' ? -from.w / 4 : end.end === 'right' ? from.w / 4 : 0);
      const y1 = from.y + from.h;
      const lane = laneOf.get(`${st.id}-${end.end}`);
      let points: { x: number; y: number }[];
      if (!to)
        points = [
          { x: x1, y: y1 },
          { x: x1, y: y1 + s.gapY * 0.7 },
        ];
      else if (lane === undefined)
        points = [
          { x: x1, y: y1 },
          { x: to.x + to.w / 2, y: to.y },
        ];
      else {
        const laneX =
          lane.side === 'left'
            ? s.pad + (lane.index + 0.5) * s.lane
            : left + inner + (lane.index + 0.5) * s.lane;
        // Its runs across go below the chips of the level it leaves and above the box it lands on.
        const turnY = y1 + s.gapY - s.runClear;
        const landY = to.y - s.runClear;
        const landX =
          lane.side === 'left'
            ? Math.max(to.x + s.inset, Math.min(to.x + to.w / 2, x1))
            : Math.min(to.x + to.w - s.inset, Math.max(to.x + to.w / 2, x1));
        points = [
          { x: x1, y: y1 },
          { x: x1, y: turnY },
          { x: laneX, y: turnY },
          { x: laneX, y: landY },
          { x: landX, y: landY },
          { x: landX, y: to.y },
        ];
      }
      const labelText = to ? lbText(end.governingLb) : `${lbText(end.governingLb)} → ?`;
      const chipW = measure(labelText, s.textSize) + 8;
      const cx = Math.min(width - s.pad - chipW / 2, Math.max(s.pad + chipW / 2, x1));
      const cy = y1 + s.gapY / 2 - (lane === undefined ? 0 : s.chipH / 2 + 2);
      const chipY = lane === undefined ? cy - s.chipH / 2 : y1 + 2;
      return {
        fromId: st.id,
        toId: to?.id,
        fromDepth: st.depth,
        toDepth: to?.depth ?? st.depth + 1,
        points,
        chip: { x: cx - chipW / 2, y: chipY, w: chipW, h: s.chipH },
        label: {
          text: labelText,
          x: cx,
          y: chipY + s.chipH / 2 + 4,
          size: s.textSize,
          strong: true,
          tone: 'ink',
          anchor: 'middle',
        },
      };
    }),
  );
  return { width, height: y - s.gapY + s.pad + 12, boxes, links: unstruck(links, width), texts };
}

type Rect = { x: number; y: number; w: number; h: number };

const overlaps = (a: Rect, b: Rect) =>
  a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;

/** Whether a line of points runs through a rectangle (checked at 2 px steps along each segment). */
function runsThrough(points: readonly { x: number; y: number }[], r: Rect): boolean {
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1], points[i]];
    const steps = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / 2));
    for (let k = 0; k <= steps; k++) {
      const x = a.x + ((b.x - a.x) * k) / steps;
      const y = a.y + ((b.y - a.y) * k) / steps;
      if (x > r.x && x < r.x + r.w && y > r.y && y < r.y + r.h) return true;
    }
  }
  return false;
}

/** Along its own line, where a straight link's chip may sit, best first (halfway down, then nearer an end). */
const chipStations = [0.5, 0.3, 0.7, 0.15, 0.85];

/**
 * Moves a straight link's chip along its own line when another line would strike it through or it would
 * sit on another chip (two ends of one box crossing on their way to boxes below, for example).
 */
function unstruck(links: DrawingLink[], width: number): DrawingLink[] {
  const placed: Rect[] = links.filter((l) => l.points.length !== 2).map((l) => l.chip);
  return links.map((link) => {
    if (link.points.length !== 2) return link;
    const [a, b] = link.points;
    const others = links.filter((l) => l !== link);
    const at = (t: number): Rect => {
      const cx = Math.min(
        width - drawingSizes.pad - link.chip.w / 2,
        Math.max(drawingSizes.pad + link.chip.w / 2, a.x + (b.x - a.x) * t),
      );
      const cy = a.y + (b.y - a.y) * t;
      return { ...link.chip, x: cx - link.chip.w / 2, y: cy - link.chip.h / 2 };
    };
    const clear = (r: Rect) =>
      !others.some((o) => runsThrough(o.points, r)) && !placed.some((p) => overlaps(p, r));
    const chip = chipStations.map(at).find(clear) ?? link.chip;
    placed.push(chip);
    const label = { ...link.label, x: chip.x + chip.w / 2, y: chip.y + chip.h / 2 + 4 };
    return { ...link, chip, label };
  });
}
