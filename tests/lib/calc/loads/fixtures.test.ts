import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildMemberLoads } from '@/lib/calc/loads';
import { roofSnowLoad } from '@/lib/calc/snow';
import { memberLoadsInputSchema, snowInputSchema } from '@/shared/schemas/calc/loads';
import { expectApprox } from '@/tests/helpers/approx';

/**
 * Fixture tests: each file holds a job's snow input and a member's load sources, and the expected snow and
 * takedown. Expected blocks are rewritten only with UPDATE_FIXTURES=1, and reviewed before commit.
 */
const dir = join(__dirname, 'fixtures');
const update = process.env.UPDATE_FIXTURES === '1';

function compare(actual: unknown, expected: unknown, path: string): void {
  if (typeof expected === 'number') {
    expect(typeof actual, path).toBe('number');
    expectApprox(actual as number, expected, { rel: 1e-9, abs: 1e-9 });
  } else if (Array.isArray(expected)) {
    expect(Array.isArray(actual), path).toBe(true);
    expect((actual as unknown[]).length, path).toBe(expected.length);
    expected.forEach((item, i) => compare((actual as unknown[])[i], item, `${path}[${i}]`));
  } else if (expected !== null && typeof expected === 'object') {
    const record = actual as Record<string, unknown>;
    expect(
      Object.keys(record)
        .filter((k) => record[k] !== undefined)
        .sort(),
      path,
    ).toEqual(Object.keys(expected).sort());
    for (const [key, value] of Object.entries(expected)) compare(record[key], value, `${path}.${key}`);
  } else {
    expect(actual, path).toBe(expected);
  }
}

describe('load takedown fixtures', () => {
  for (const file of readdirSync(dir).filter((name) => name.endsWith('.json'))) {
    it(file, () => {
      const fixture = JSON.parse(readFileSync(join(dir, file), 'utf8'));
      const snow = roofSnowLoad(snowInputSchema.parse(fixture.snow));
      const takedown = buildMemberLoads(
        memberLoadsInputSchema.parse({ ...fixture.member, roofSnowPsf: snow.designPsf }),
      );
      const actual = JSON.parse(JSON.stringify({ snow, takedown }));
      if (update) {
        writeFileSync(join(dir, file), `${JSON.stringify({ ...fixture, expected: actual }, null, 2)}\n`);
      }
      compare(actual, fixture.expected, 'expected');
    });
  }
});
