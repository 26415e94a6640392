import { describe, it } from 'vitest';
import {
  DIAGRAM_PAD_PX,
  linearScale,
  memberFrame,
  spanScale,
  toEnteredFt,
} from '@/lib/ui/diagrams/span-frame';
import { expectApprox } from '@/tests/helpers/approx';
import { check, fixtureBody, WIDTHS } from './cases';

const result = check(fixtureBody);

describe('span scale', () => {
  it.each(WIDTHS)('puts the whole piece (length to buy) between the paddings at %i px', (width) => {
    const scale = spanScale(result, width);
    expectApprox(scale.memberLeftPx, DIAGRAM_PAD_PX, { abs: 1e-9 });
    expectApprox(scale.memberRightPx, width - DIAGRAM_PAD_PX, { abs: 1e-9 });
    expectApprox(scale.pxPerFt * result.spans.lengthToBuyFt, width - 2 * DIAGRAM_PAD_PX, { abs: 1e-9 });
  });

  it('places bearing centres at the ends of the design span and faces at the ends of the clear span', () => {
    const scale = spanScale(result, 390);
    // 4-1/2 in bearings (the fixture): the design frame starts 2-1/4 in from the end of the piece
    expectApprox(scale.px(0), scale.memberLeftPx + (2.25 / 12) * scale.pxPerFt, { abs: 1e-9 });
    expectApprox(scale.leftCentrePx, scale.px(0), { abs: 1e-9 });
    expectApprox(scale.rightCentrePx, scale.px(result.spans.designSpanFt), { abs: 1e-9 });
    expectApprox(scale.rightFacePx - scale.leftFacePx, result.spans.clearSpanFt * scale.pxPerFt, {
      abs: 1e-9,
    });
    expectApprox(scale.leftFacePx, scale.px(2.25 / 12), { abs: 1e-9 });
  });

  it("reads the engine's takedown positions in the analysis frame: the input's 9 ft post is 9 ft from the face", () => {
    const frame = memberFrame(result);
    const post = result.takedown.find((l) => l.label === 'Post above');
    expectApprox(toEnteredFt(post?.atFt ?? NaN, frame), 9, { abs: 1e-12 });
    const wall = result.takedown.find((l) => l.label === 'Wall above');
    expectApprox(toEnteredFt(wall?.startFt ?? NaN, frame), 0, { abs: 1e-12 });
    expectApprox(toEnteredFt(wall?.endFt ?? NaN, frame), 6, { abs: 1e-12 });
  });

  it('samples run over the design span, support centre to support centre', () => {
    const samples = result.diagram?.samples ?? [];
    expectApprox(samples[0].xFt, 0, { abs: 1e-12 });
    expectApprox(samples[samples.length - 1].xFt, result.spans.designSpanFt, { abs: 1e-12 });
  });
});

describe('linearScale', () => {
  it('maps a domain onto a range, backwards too', () => {
    const y = linearScale([0, 100], [120, 20]);
    expectApprox(y(0), 120, { abs: 1e-12 });
    expectApprox(y(100), 20, { abs: 1e-12 });
    expectApprox(y(25), 95, { abs: 1e-12 });
  });
});
