import { describe, expect, it } from 'vitest';
import { planShoring } from '@/lib/calc';
import { studCount, temporaryWalls, TEMPORARY_WALL_PAST_END_FT } from '@/lib/budget';
import { shoringPlanInputSchema } from '@/shared/schemas/calc/shoring';

describe('temporary wall studs (common practice: studs at layout, an end stud, plates top and bottom)', () => {
  it('counts studs at 16 and 24 in on centre', () => {
    expect(studCount(10, 16)).toBe(9); // 120 in ÷ 16 = 7.5 bays → 8 bays, 9 studs
    expect(studCount(10, 24)).toBe(6); // 5 bays, 6 studs
    expect(studCount(12, 16)).toBe(10); // 9 bays exactly
    expect(studCount(12, 24)).toBe(7);
    expect(studCount(16, 16)).toBe(13);
  });

  it('takes its layout from the engine’s shoring plan, one wall each side', () => {
    const plan = planShoring(
      shoringPlanInputSchema.parse({
        member: {
          kind: 'beam',
          edition: 'ASCE 7-22',
          clearSpanFt: 12,
          sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
        },
        layout: 'both-sides',
        studs: {
          studSpacingIn: 16,
          heightFt: 8,
          materialId: 'sawn-spruce-pine-fir-no1-no2',
          studSizeId: '2x4',
        },
        standsOn: 'floor-framing-perpendicular',
      }),
    );
    const walls = temporaryWalls(plan, 12);
    expect(walls).toHaveLength(2);
    for (const [i, wall] of walls.entries()) {
      const spacingIn = plan.walls[i].check.layoutSpacingIn;
      expect(spacingIn).not.toBeNull();
      expect(wall.lengthFt).toBe(12 + 2 * TEMPORARY_WALL_PAST_END_FT);
      expect(wall.spacingIn).toBe(spacingIn);
      expect(wall.studs).toBe(studCount(14, spacingIn!));
      expect(wall.plateLf).toBe(28);
    }
  });

  it('leaves the studs out when no common layout carries the load (shores are rented)', () => {
    const walls = temporaryWalls({ walls: [{ side: 'A', check: { layoutSpacingIn: null } }] }, 8);
    expect(walls[0]).toEqual({ side: 'A', lengthFt: 10, spacingIn: null, studs: 0, plateLf: 0 });
  });
});
