import { describe, expect, it } from 'vitest';
import { CalcInputError, evaluateLoadPath } from '@/lib/calc';
import { evaluateMember, type MemberToEvaluate } from '@/server/api/members/member-evaluation';
import { runInPool, runTask } from '@/server/services/calc-pool';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';

/** Invented demo header: 2-ply 2x10 Douglas Fir-Larch No.2 over 6 ft, under 13 ft of roof and 6 ft of ceiling. */
const header: MemberToEvaluate = {
  label: 'Kitchen doorway',
  wall: 'Kitchen / dining',
  buildingWidthFt: 28,
  groundSnowPsf: 25,
  input: memberCheckInputSchema.parse({
    kind: 'header',
    edition: 'ASCE 7-22',
    clearSpanFt: 6,
    sources: [
      { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
      { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
    ],
    materialId: 'sawn-douglas-fir-larch-no2',
    sizeId: '2-ply-2x10',
  }),
};

const thrown = (work: () => unknown) => {
  try {
    work();
  } catch (error) {
    return error;
  }
  throw new Error('expected the work to throw');
};

describe('the calculation pool', () => {
  it('stores for a member save what the engine makes of it on the event loop, to the last sample', async () => {
    const inPool = await runInPool('memberFields', header);
    expect(inPool).toEqual(evaluateMember(header));
    expect(inPool.result.diagram?.samples.length).toBeGreaterThan(10);
  });

  it('hands back the engine’s input error as the same CalcInputError, field and message', async () => {
    const bad = { ...header, input: { ...header.input, sizeId: '9-ply-2x99' } };
    const here = thrown(() => evaluateMember(bad));
    expect(here).toBeInstanceOf(CalcInputError);
    const fromPool = await runInPool('memberFields', bad).catch((error: unknown) => error);
    expect(fromPool).toBeInstanceOf(CalcInputError);
    expect(fromPool).toMatchObject({
      field: (here as CalcInputError).field,
      message: (here as CalcInputError).message,
    });
  });

  it('checks a saved member and its job’s load path in one trip, as the event loop would', async () => {
    const path = {
      edition: 'ASCE 7-22' as const,
      nodes: [
        {
          id: 'h1',
          label: header.label,
          element: { kind: 'member' as const, input: { ...header.input, label: header.label } },
          bearings: [],
        },
      ],
    };
    const saved = await runTask('memberSave', { member: header, pathJson: JSON.stringify(path) });
    expect(saved.fields).toEqual({ ok: true, value: evaluateMember(header) });
    // The path comes back without the beams' own member checks, which a save does not read.
    const onLoop = evaluateLoadPath(path);
    const elements = onLoop.elements.map(({ memberResult: _memberResult, ...element }) => element);
    expect(onLoop.elements[0].memberResult).toBeDefined();
    expect(saved.path).toEqual({ ok: true, value: { ...onLoop, elements } });
  });

  it('leaves the load path alone when the member’s own input is refused', async () => {
    const bad = { ...header, input: { ...header.input, sizeId: '9-ply-2x99' } };
    const saved = await runTask('memberSave', { member: bad, pathJson: '{}' });
    expect(saved.fields).toMatchObject({
      ok: false,
      field: (thrown(() => evaluateMember(bad)) as CalcInputError).field,
    });
    expect(saved.path).toBeUndefined();
  });
});
