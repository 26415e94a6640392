import { describe, expect, it } from 'vitest';
import { checkMember, ENGINE_VERSION } from '@/lib/calc';
import { materialName, sizeName } from '@/lib/requests/catalogue-names';
import { diffVersions, type VersionDiff } from '@/lib/requests/version-diff';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { jobInputSchema } from '@/shared/schemas/jobs';
import { requestComposeSchema } from '@/shared/schemas/requests/compose';
import type { RequestSnapshot, SnapshotMember } from '@/shared/schemas/requests/snapshot';
import { SAMPLE_HEADER } from '@/tests/helpers/sample-bodies';

/** A member as a snapshot holds it, its result from the real engine (invented demo inputs). */
function member(id: string, label: string, body: MemberCheckInputBody): SnapshotMember {
  const input = memberCheckInputSchema.parse(body);
  const result = checkMember(input);
  return {
    id,
    kind: input.kind,
    label,
    wall: 'Kitchen/dining',
    input,
    summary: {
      state: result.pass ? 'passes' : 'fails',
      pass: result.pass,
      governingCheck: result.governing.check,
      governingRatio: result.governing.ratio,
      warningsCount: result.warnings.length,
      sizeLabel: result.member.sizeLabel,
      materialLabel: result.member.materialLabel,
      engineerReasons: [],
    },
    result,
    prescriptive: null,
    engineVersion: ENGINE_VERSION,
  };
}

function snapshot(
  version: number,
  members: SnapshotMember[],
  extra: Partial<RequestSnapshot> = {},
): RequestSnapshot {
  const composed = requestComposeSchema.parse({ questions: 'Can it be flush?' });
  return {
    number: 4,
    version,
    sentAt: '2026-12-01T10:00:00.000Z',
    firm: { name: 'Sample Remodeling' },
    contractor: { name: 'Sam Sample', email: 'sam@example.test' },
    engineerEmail: 'eng@example.test',
    job: { ...jobInputSchema.parse({ name: 'Kitchen opening (demo)', groundSnowPsf: 30 }), id: 'job-1' },
    jurisdiction: composed.jurisdiction,
    conditions: composed.conditions,
    constraints: composed.constraints,
    phoneBack: composed.phoneBack,
    questions: composed.questions,
    members,
    engineVersion: ENGINE_VERSION,
    files: [],
    ...extra,
  };
}

const header = member('m-1', 'Kitchen header', SAMPLE_HEADER);
const lines = (diff: VersionDiff, group: string, section: string) =>
  diff.groups.find((g) => g.title === group)?.sections.find((s) => s.title === section)?.lines ?? [];

describe('diffVersions', () => {
  it('says nothing changed between two equal versions', () => {
    const diff = diffVersions(snapshot(1, [header]), snapshot(2, [header]));
    expect(diff.groups).toEqual([]);
    expect(diff.count).toBe(0);
    expect(diff).toMatchObject({ fromVersion: 1, toVersion: 2 });
  });

  it('names a changed span in words, in ft-in with its flag, under the member’s label', () => {
    const longer = member('m-1', 'Kitchen header', {
      ...SAMPLE_HEADER,
      clearSpanFt: 6.5,
      flags: { clearSpanFt: 'measured' },
    });
    const diff = diffVersions(snapshot(1, [header]), snapshot(2, [longer]));
    const span = lines(diff, 'Kitchen header', 'Span and bearing');
    expect(span).toContainEqual({
      field: 'Clear span',
      before: `6' 0" (assumed)`,
      after: `6' 6" (measured)`,
      kind: 'changed',
    });
    expect(span.map((l) => l.field)).toContain('Length to buy');
    // The result follows the inputs: the reactions grew with the span.
    expect(lines(diff, 'Kitchen header', 'Result of the preliminary check').map((l) => l.field)).toContain(
      'Largest reaction, left end',
    );
  });

  it('lists an added load as added with its values in psf and ft-in', () => {
    const withFloor = member('m-1', 'Kitchen header', {
      ...SAMPLE_HEADER,
      sources: [
        ...SAMPLE_HEADER.sources,
        { kind: 'floor', label: 'bath', tributaryFt: 7.5, deadPsf: 10, livePsf: 40 },
      ],
    });
    const loads = lines(
      diffVersions(snapshot(1, [header]), snapshot(2, [withFloor])),
      'Kitchen header',
      'Loads',
    );
    expect(loads).toContainEqual({
      field: 'Floor load (bath)',
      before: null,
      after: `tributary width 7' 6", dead load 10 psf, live load 40 psf, joists continuous over the member: no (assumed)`,
      kind: 'added',
    });
    // The roof and ceiling loads before it did not change, so they are not listed.
    expect(
      loads.filter((l) => l.field.startsWith('Roof load') || l.field.startsWith('Ceiling load')),
    ).toEqual([]);
  });

  it('names a changed field of a load by the load and the field', () => {
    const heavier = member('m-1', 'Kitchen header', {
      ...SAMPLE_HEADER,
      sources: [SAMPLE_HEADER.sources[0], { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 20 }],
    });
    const loads = lines(
      diffVersions(snapshot(1, [header]), snapshot(2, [heavier])),
      'Kitchen header',
      'Loads',
    );
    expect(loads).toEqual([
      { field: 'Ceiling load: live load', before: '10 psf', after: '20 psf', kind: 'changed' },
    ]);
  });

  it('shows a removed member as one group marked removed, named by its label', () => {
    const stair = member('m-2', 'Stair header', { ...SAMPLE_HEADER, clearSpanFt: 4 });
    const diff = diffVersions(snapshot(1, [header, stair]), snapshot(2, [header]));
    expect(diff.groups.map((g) => [g.title, g.kind])).toEqual([['Stair header', 'removed']]);
    const span = lines(diff, 'Stair header', 'Span and bearing');
    expect(span).toContainEqual({
      field: 'Clear span',
      before: `4' 0" (assumed)`,
      after: null,
      kind: 'removed',
    });
    expect(diff.groups[0].sections.every((s) => s.lines.every((l) => l.kind === 'removed'))).toBe(true);
  });

  it('shows a changed material and size by the engine’s names', () => {
    const lvl = member('m-1', 'Kitchen header', {
      ...SAMPLE_HEADER,
      materialId: 'lvl-2.0e',
      sizeId: '2-ply-1.75x11.875',
    });
    const material = lines(
      diffVersions(snapshot(1, [header]), snapshot(2, [lvl])),
      'Kitchen header',
      'Material and size',
    );
    expect(material).toEqual([
      {
        field: 'Material',
        before: header.summary.materialLabel,
        after: lvl.summary.materialLabel,
        kind: 'changed',
      },
      { field: 'Size', before: header.summary.sizeLabel, after: lvl.summary.sizeLabel, kind: 'changed' },
    ]);
    expect(lvl.summary.materialLabel).not.toBe(header.summary.materialLabel);
  });

  it('names post and plate materials by the catalogue’s names, not its ids', () => {
    // Names as the catalogue prints the NDS Supplement 2018 Table 4A species and grades.
    const onPosts = (materialId: string) =>
      member('m-1', 'Kitchen header', {
        ...SAMPLE_HEADER,
        supportKind: 'post',
        plateMaterialId: materialId,
        posts: { materialId, sizeId: '6x6', heightFt: 7 },
      });
    const span = lines(
      diffVersions(
        snapshot(1, [onPosts('sawn-hem-fir-no2')]),
        snapshot(2, [onPosts('sawn-douglas-fir-larch-no2')]),
      ),
      'Kitchen header',
      'Span and bearing',
    );
    expect(span).toEqual([
      {
        field: 'Plate under the jack studs',
        before: 'Hem-Fir No.2 (assumed)',
        after: 'Douglas Fir-Larch No.2 (assumed)',
        kind: 'changed',
      },
      {
        field: 'Posts: material',
        before: 'Hem-Fir No.2 (assumed)',
        after: 'Douglas Fir-Larch No.2 (assumed)',
        kind: 'changed',
      },
    ]);
  });

  it('reads an id the catalogue does not hold (an older engine’s) as its words', () => {
    expect(materialName('sawn-western-larch-no3')).toBe('sawn western larch no3');
    expect(sizeName('sawn-hem-fir-no2', '2-ply-2x10')).toBe('2-ply 2x10');
    expect(sizeName('sawn-hem-fir-no2', '9x99')).toBe('9x99');
    expect(materialName(null)).toBeNull();
  });

  it('lists photos added by where they were taken and their caption, and a changed question', () => {
    const photo = {
      id: 'f-1',
      place: 'attic-over-wall' as const,
      caption: 'Joists over the stair, tape at 16 in',
      fileName: 'attic-over.png',
      mimeType: 'image/png',
      sizeBytes: 120,
      sha256: 'a'.repeat(64),
    };
    const diff = diffVersions(
      snapshot(1, [header]),
      snapshot(2, [header], { files: [photo], questions: 'Can both be flush?' }),
    );
    expect(diff.groups.map((g) => g.title)).toEqual(['Job and request']);
    expect(lines(diff, 'Job and request', 'Photos')).toEqual([
      {
        field: 'Photo attic-over.png',
        before: null,
        after: 'Attic over the wall: Joists over the stair, tape at 16 in',
        kind: 'added',
      },
    ]);
    expect(lines(diff, 'Job and request', 'Questions')).toEqual([
      {
        field: 'Questions for the engineer',
        before: 'Can it be flush?',
        after: 'Can both be flush?',
        kind: 'changed',
      },
    ]);
    expect(diff.count).toBe(2);
  });
});
