import { describe, expect, it } from 'vitest';
import { amountText, drawnMagnitude, groupLoads, loadLabelText } from '@/lib/ui/diagrams/load-groups';
import type { MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';
import { busyBody, check, fixtureBody, headerBody } from './cases';

describe('groupLoads', () => {
  it("joins one source's lines by type and keeps sources apart (fixture)", () => {
    const result = check(fixtureBody);
    const loads = groupLoads(result.takedown, result.spans.designSpanFt);
    expect(loads.map(loadLabelText)).toEqual([
      'Floor · D+L 624 plf',
      'Wall above · D 48 plf',
      'Post above · D+L 1,500 lb',
      `Self-weight · D ${Math.round(result.member.selfWeightPlf)} plf`,
    ]);
    const floor = loads[0];
    expect(floor.kind === 'uniform' && floor.full).toBe(true);
  });

  it('keeps two sources with one label apart', () => {
    const body: MemberCheckInputBody = {
      ...headerBody,
      sources: [
        { kind: 'roof', tributaryFt: 6, deadPsf: 15, roofLivePsf: 20 },
        { kind: 'roof', tributaryFt: 8, deadPsf: 15, roofLivePsf: 20 },
      ],
      selfWeight: false,
    };
    const result = check(body);
    expect(groupLoads(result.takedown, result.spans.designSpanFt).map(amountText)).toEqual([
      'D+Lr 210 plf', // 6 ft × (15 + 20) psf
      'D+Lr 280 plf', // 8 ft × (15 + 20) psf
    ]);
  });

  it('lists roof live and snow apart and draws the load at dead plus the larger', () => {
    const result = check(busyBody);
    const roof = groupLoads(result.takedown, result.spans.designSpanFt)[0];
    const snow = roof.parts.find((p) => p.type === 'S')?.value ?? 0;
    expect(amountText(roof)).toBe(`D 120, Lr 160, S ${Math.round(snow)} plf`);
    expectApprox(drawnMagnitude(roof), 120 + Math.max(160, snow), { abs: 1e-9 });
  });
});
