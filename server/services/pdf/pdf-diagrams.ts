import { rgb } from 'pdf-lib';
import { formatLb, formatNumber, formatPlf } from '@/lib/format';
import type { MemberCheckInput, MemberCheckResult } from '@/shared/schemas/calc/member';
import { ACCENT, INK, MUTED, PAGE, RULE, type PdfWriter } from './pdf-writer';

/**
 * The member's four diagrams (loads, shear, moment, deflection) and a section and plan sketch, drawn as
 * PDF vector paths from the engine's stored takedown and diagram samples, never as pictures.
 */

const HEIGHT = 78;
const FILL = rgb(0.85, 0.88, 0.93);
type Sample = NonNullable<MemberCheckResult['diagram']>['samples'][number];

interface Frame {
  x0: number;
  width: number;
  top: number;
  spanFt: number;
}

const xAt = (frame: Frame, ft: number) => frame.x0 + (ft / frame.spanFt) * frame.width;

function title(writer: PdfWriter, text: string, top: number): void {
  writer.page.drawText(text, { x: PAGE.margin, y: top - 9, size: 8.5, font: writer.bold, color: INK });
}

/** A curve over the span: its path, the filled area to the axis and the extreme value written at its place. */
function curve(
  writer: PdfWriter,
  frame: Frame,
  name: string,
  samples: Sample[],
  value: (s: Sample) => number,
  label: (v: number) => string,
  downIsPositive = false,
): void {
  const top = frame.top;
  title(writer, name, top);
  const values = samples.map(value);
  const extreme = Math.max(...values.map(Math.abs), 1e-9);
  const axisY = top - 14 - (HEIGHT - 14) / 2;
  const scale = (HEIGHT - 30) / 2 / extreme;
  const pointY = (v: number) => axisY + (downIsPositive ? -v : v) * scale;
  // drawSvgPath puts the path's origin at (x, y) with SVG's y pointing down.
  const svgY = (y: number) => PAGE.height - y;
  const points = samples.map(
    (s, i) => `${xAt(frame, s.xFt).toFixed(2)} ${svgY(pointY(values[i])).toFixed(2)}`,
  );
  const first = samples[0];
  const last = samples[samples.length - 1];
  const area = `M ${xAt(frame, first.xFt)} ${svgY(axisY)} L ${points.join(' L ')} L ${xAt(frame, last.xFt)} ${svgY(axisY)} Z`;
  writer.page.drawSvgPath(area, { x: 0, y: PAGE.height, color: FILL, borderWidth: 0 });
  writer.page.drawSvgPath(`M ${points.join(' L ')}`, {
    x: 0,
    y: PAGE.height,
    borderColor: INK,
    borderWidth: 1.1,
  });
  writer.page.drawLine({
    start: { x: frame.x0, y: axisY },
    end: { x: frame.x0 + frame.width, y: axisY },
    thickness: 0.6,
    color: MUTED,
  });
  const at = values.findIndex((v) => Math.abs(v) === extreme);
  if (at >= 0) {
    const text = label(values[at]);
    const tx = Math.min(Math.max(xAt(frame, samples[at].xFt) - 20, frame.x0), frame.x0 + frame.width - 80);
    const ty = pointY(values[at]) + (pointY(values[at]) >= axisY ? 3 : -9);
    writer.page.drawText(text, { x: tx, y: ty, size: 7.5, font: writer.font, color: INK });
  }
}

/** The loads on the span: uniform loads as bands (height by plf), point loads as arrows, each labelled. */
function loads(writer: PdfWriter, frame: Frame, result: MemberCheckResult): void {
  const top = frame.top;
  title(writer, 'Loads (unfactored, by source)', top);
  const beamY = top - HEIGHT + 14;
  writer.page.drawRectangle({ x: frame.x0, y: beamY - 4, width: frame.width, height: 4, color: INK });
  const groups = new Map<
    string,
    { label: string; plf: number; lb: number; start: number; end: number; at?: number }
  >();
  for (const line of result.takedown) {
    const key =
      line.pLb !== undefined
        ? `p:${line.label}:${line.atFt}`
        : `u:${line.label}:${line.startFt}:${line.endFt}`;
    const group = groups.get(key) ?? {
      label: line.label,
      plf: 0,
      lb: 0,
      start: line.startFt ?? 0,
      end: line.endFt ?? frame.spanFt,
      at: line.atFt,
    };
    group.plf += line.wPlf ?? 0;
    group.lb += line.pLb ?? 0;
    groups.set(key, group);
  }
  const uniform = [...groups.values()].filter((g) => g.at === undefined && g.plf > 0);
  const points = [...groups.values()].filter((g) => g.at !== undefined);
  const maxPlf = Math.max(...uniform.map((g) => g.plf), 1);
  let stack = beamY;
  for (const g of uniform) {
    // A band is tall enough for its label, taller by its share of the largest load.
    const h = 9 + (g.plf / maxPlf) * 8;
    writer.page.drawRectangle({
      x: xAt(frame, g.start),
      y: stack,
      width: xAt(frame, g.end) - xAt(frame, g.start),
      height: h,
      color: FILL,
      borderColor: INK,
      borderWidth: 0.5,
    });
    writer.page.drawText(`${g.label} ${formatPlf(g.plf)}`, {
      x: xAt(frame, g.start) + 3,
      y: stack + h / 2 - 2.5,
      size: 6.5,
      font: writer.font,
      color: INK,
    });
    stack += h + 1;
  }
  points.forEach((g, i) => {
    const x = xAt(frame, g.at ?? 0);
    const tipY = stack + 1;
    const tailY = top - 16 - (i % 2) * 9;
    writer.page.drawLine({ start: { x, y: tailY }, end: { x, y: tipY }, thickness: 1, color: ACCENT });
    writer.page.drawSvgPath(
      `M ${x - 3} ${PAGE.height - tipY - 5} L ${x} ${PAGE.height - tipY} L ${x + 3} ${PAGE.height - tipY - 5} Z`,
      {
        x: 0,
        y: PAGE.height,
        color: ACCENT,
        borderWidth: 0,
      },
    );
    writer.page.drawText(`${g.label} ${formatLb(g.lb)} at ${formatNumber(g.at ?? 0, 2)} ft`, {
      x: Math.min(x + 4, frame.x0 + frame.width - 110),
      y: tailY - 3,
      size: 6.5,
      font: writer.font,
      color: INK,
    });
  });
  for (const support of result.reactions.bySupport ?? []) {
    const x = xAt(frame, support.atFt);
    writer.page.drawSvgPath(
      `M ${x} ${PAGE.height - beamY + 4} L ${x - 5} ${PAGE.height - beamY + 12} L ${x + 5} ${PAGE.height - beamY + 12} Z`,
      {
        x: 0,
        y: PAGE.height,
        color: MUTED,
        borderWidth: 0,
      },
    );
  }
}

/** Draws the four diagrams one under another over the member's analysed length. */
export function drawMemberDiagrams(writer: PdfWriter, result: MemberCheckResult): void {
  const samples = result.diagram?.samples ?? [];
  if (samples.length < 2) {
    writer.text('No diagram samples were stored with this result.', { color: MUTED });
    return;
  }
  const spanFt = samples[samples.length - 1].xFt - samples[0].xFt || result.spans.designSpanFt;
  const frameAt = (top: number): Frame => ({
    x0: PAGE.margin + 10,
    width: writer.contentWidth - 20,
    top,
    spanFt,
  });
  const parts: ((frame: Frame) => void)[] = [
    (f) => loads(writer, f, result),
    (f) =>
      curve(
        writer,
        f,
        `Shear V (lb), ${result.diagram?.combination ?? ''}`,
        samples,
        (s) => s.shearLb,
        (v) => formatLb(v),
      ),
    (f) =>
      curve(
        writer,
        f,
        'Moment M (lb·ft)',
        samples,
        (s) => s.momentLbFt,
        (v) => `${formatNumber(v)} lb·ft`,
      ),
    (f) =>
      curve(
        writer,
        f,
        'Deflection (in, down)',
        samples,
        (s) => s.deflectionIn,
        (v) => `${formatNumber(v, 3)} in`,
        true,
      ),
  ];
  for (const draw of parts) {
    writer.ensure(HEIGHT + 6);
    draw(frameAt(writer.y));
    writer.y -= HEIGHT + 6;
  }
}

/**
 * A section through the opening (the member on its supports, the clear span and the bearing lengths, the
 * load sources above) and a plan (the wall, the opening, the joists or rafters each side with their
 * tributary widths), drawn from the inputs, not to scale.
 */
export function drawSketch(writer: PdfWriter, input: MemberCheckInput, result: MemberCheckResult): void {
  const height = 150;
  writer.ensure(height + 20);
  const top = writer.y;
  const left = PAGE.margin + 20;
  const width = writer.contentWidth / 2 - 40;
  writer.page.drawText('Section (not to scale)', {
    x: left,
    y: top - 10,
    size: 8.5,
    font: writer.bold,
    color: INK,
  });
  const beamTop = top - 70;
  writer.page.drawRectangle({
    x: left,
    y: beamTop - 14,
    width,
    height: 14,
    color: FILL,
    borderColor: INK,
    borderWidth: 0.8,
  });
  writer.page.drawText(`${result.member.sizeLabel} ${result.member.materialLabel}`.slice(0, 60), {
    x: left + 4,
    y: beamTop - 10,
    size: 6.5,
    font: writer.font,
    color: INK,
  });
  for (const x of [left, left + width - 10]) {
    writer.page.drawRectangle({
      x,
      y: beamTop - 60,
      width: 10,
      height: 46,
      borderColor: INK,
      borderWidth: 0.8,
    });
  }
  writer.page.drawLine({
    start: { x: left + 10, y: beamTop - 70 },
    end: { x: left + width - 10, y: beamTop - 70 },
    thickness: 0.5,
    color: MUTED,
  });
  writer.page.drawText(
    `clear span ${formatNumber(result.spans.clearSpanFt, 2)} ft; bearing ${formatNumber(result.spans.bearingLeftIn, 2)} / ${formatNumber(result.spans.bearingRightIn, 2)} in`,
    {
      x: left + 12,
      y: beamTop - 80,
      size: 6.5,
      font: writer.font,
      color: INK,
    },
  );
  input.sources.slice(0, 5).forEach((source, i) => {
    const what =
      source.kind === 'point'
        ? `point load ${formatLb(source.deadLb + source.liveLb + source.roofLiveLb + source.snowLb)} at ${formatNumber(source.atFt, 2)} ft`
        : source.kind === 'wall-above'
          ? 'wall above'
          : `${source.kind}, tributary ${formatNumber(source.tributaryFt, 2)} ft`;
    writer.page.drawText(`above: ${what}`, {
      x: left + 4,
      y: beamTop + 8 + i * 9,
      size: 6.5,
      font: writer.font,
      color: INK,
    });
  });

  const planLeft = PAGE.margin + writer.contentWidth / 2 + 10;
  writer.page.drawText('Plan (not to scale)', {
    x: planLeft,
    y: top - 10,
    size: 8.5,
    font: writer.bold,
    color: INK,
  });
  const wallY = top - 85;
  const planWidth = width;
  const gap = planWidth * 0.5;
  const gapStart = planLeft + (planWidth - gap) / 2;
  writer.page.drawRectangle({ x: planLeft, y: wallY - 3, width: gapStart - planLeft, height: 6, color: INK });
  writer.page.drawRectangle({
    x: gapStart + gap,
    y: wallY - 3,
    width: planLeft + planWidth - gapStart - gap,
    height: 6,
    color: INK,
  });
  writer.page.drawLine({
    start: { x: gapStart, y: wallY },
    end: { x: gapStart + gap, y: wallY },
    thickness: 1.5,
    color: ACCENT,
    dashArray: [3, 2],
  });
  writer.page.drawText('opening (member)', {
    x: gapStart + 4,
    y: wallY - 12,
    size: 6.5,
    font: writer.font,
    color: INK,
  });
  const spans = input.sources.filter((s) => s.kind !== 'point' && s.kind !== 'wall-above');
  for (let i = 0; i < 5; i += 1) {
    const x = planLeft + 12 + (i * (planWidth - 24)) / 4;
    writer.page.drawLine({
      start: { x, y: wallY + 50 },
      end: { x, y: wallY - 50 },
      thickness: 0.5,
      color: RULE,
    });
  }
  writer.page.drawText('joists / rafters bear on the wall, both sides', {
    x: planLeft,
    y: wallY + 56,
    size: 6.5,
    font: writer.font,
    color: MUTED,
  });
  const tributary = spans
    .map((s) => ('tributaryFt' in s ? `${s.kind} ${formatNumber(s.tributaryFt, 2)} ft` : ''))
    .join(', ');
  writer.page.drawText(`tributary widths: ${tributary || 'none given'}`.slice(0, 70), {
    x: planLeft,
    y: wallY - 62,
    size: 6.5,
    font: writer.font,
    color: INK,
  });
  writer.y -= height;
}
