import { describe, expect, it } from 'vitest';
import { checkColumn, checkShoringWall, sizeFootingPad } from '@/lib/calc/columns';
import {
  columnInputSchema,
  footingPadInputSchema,
  shoringWallInputSchema,
} from '@/shared/schemas/calc/materials';

describe('input schemas for posts, shoring walls and footing pads', () => {
  it('parsed inputs run through the engine unchanged', () => {
    const column = columnInputSchema.parse({
      materialId: 'sawn-spruce-pine-fir-no1-no2',
      sizeId: '4x4',
      heightFt: 7.3,
      loadLb: 4800,
      CD: 1,
    });
    expect(checkColumn(column).pass).toBe(true);
    const wall = shoringWallInputSchema.parse({
      loadPlf: 600,
      studSpacingIn: 16,
      heightFt: 8,
      materialId: 'sawn-spruce-pine-fir-no1-no2',
      studSizeId: '2x4',
      weakAxisBracing: 'mid-height-blocking',
    });
    expect(checkShoringWall(wall).pass).toBe(true);
    expect(sizeFootingPad(footingPadInputSchema.parse({ loadLb: 6000, padThicknessIn: 12 })).sideIn).toBe(26);
  });

  it('reports field paths for bad input', () => {
    const column = columnInputSchema.safeParse({ materialId: 'x', heightFt: -1, loadLb: 1, CD: 1 });
    expect(column.success).toBe(false);
    const paths = column.error?.issues.map((i) => i.path.join('.')) ?? [];
    expect(paths).toEqual(expect.arrayContaining(['sizeId', 'heightFt']));
    const pad = footingPadInputSchema.safeParse({ loadLb: 0, padThicknessIn: 12 });
    expect(pad.error?.issues[0]?.path).toEqual(['loadLb']);
  });
});
