import { rgb } from 'pdf-lib';
import { drawingLayout, type DrawingStep, type DrawingText } from '@/lib/ui/load-path/drawing-layout';
import type { SnapshotLoadPathStep } from '@/shared/schemas/requests/snapshot';
import { INK, MUTED, PAGE, PAPER, RULE, type PdfWriter } from './pdf-writer';

const DANGER = rgb(0.7, 0.12, 0.1);
const DANGER_SOFT = rgb(0.99, 0.92, 0.9);
const toneColor = { ink: INK, muted: MUTED, danger: DANGER } as const;

/**
 * The snapshot's steps as drawing steps. Each end names the step it bears on by id; a package sent before
 * ids were kept names it by label only, and then the end is matched to the first step below it with that label.
 */
export function snapshotSteps(steps: readonly SnapshotLoadPathStep[]): DrawingStep[] {
  return steps.map((s) => ({
    id: s.id,
    label: s.label,
    kind: s.kind,
    state: s.state,
    depth: s.depth,
    ends: s.ends.map((e) => ({
      end: e.end,
      ontoId: e.ontoId ?? steps.find((t) => t.depth > s.depth && t.label === e.ontoLabel)?.id,
      governingLb: e.governingLb,
    })),
  }));
}

/**
 * The section of the load path to the ground, drawn as vectors from the same layout as the screen
 * (drawingLayout), measured with the embedded Inter so no label runs past the content width.
 */
export function drawLoadPathSection(w: PdfWriter, steps: readonly SnapshotLoadPathStep[]): void {
  const layout = drawingLayout(snapshotSteps(steps), w.contentWidth, (text, size) =>
    w.bold.widthOfTextAtSize(text, size),
  );
  w.ensure(layout.height);
  const top = w.y;
  const x = (lx: number) => PAGE.margin + lx;
  const y = (ly: number) => top - ly;
  const text = (t: DrawingText) => {
    const font = t.strong ? w.bold : w.font;
    const width = font.widthOfTextAtSize(t.text, t.size);
    w.page.drawText(t.text, {
      x: x(t.anchor === 'middle' ? t.x - width / 2 : t.x),
      y: y(t.y),
      size: t.size,
      font,
      color: toneColor[t.tone],
    });
  };
  for (const link of layout.links) {
    const color = link.toId ? INK : DANGER;
    for (let i = 1; i < link.points.length; i++) {
      const [a, b] = [link.points[i - 1], link.points[i]];
      w.page.drawLine({
        start: { x: x(a.x), y: y(a.y) },
        end: { x: x(b.x), y: y(b.y) },
        thickness: 1.5,
        color,
        dashArray: link.toId ? undefined : [4, 3],
      });
    }
    const tip = link.points[link.points.length - 1];
    for (const dx of [-4, 4])
      w.page.drawLine({
        start: { x: x(tip.x + dx), y: y(tip.y - 6) },
        end: { x: x(tip.x), y: y(tip.y) },
        color,
        thickness: 1.5,
      });
    const c = link.chip;
    w.page.drawRectangle({
      x: x(c.x),
      y: y(c.y + c.h),
      width: c.w,
      height: c.h,
      color: PAPER,
      borderColor: RULE,
      borderWidth: 0.75,
    });
    text(link.label);
  }
  for (const box of layout.boxes) {
    w.page.drawRectangle({
      x: x(box.x),
      y: y(box.y + box.h),
      width: box.w,
      height: box.h,
      color: box.danger ? DANGER_SOFT : PAPER,
      borderColor: box.danger ? DANGER : RULE,
      borderWidth: box.danger ? 1.5 : 0.75,
    });
    if (box.ground)
      for (let i = 0; i < Math.floor(box.w / 10); i++)
        w.page.drawLine({
          start: { x: x(box.x + i * 10), y: y(box.y + box.h + 10) },
          end: { x: x(box.x + i * 10 + 8), y: y(box.y + box.h + 2) },
          thickness: 0.75,
          color: RULE,
        });
  }
  for (const t of layout.texts) text(t);
  w.y = top - layout.height;
}
