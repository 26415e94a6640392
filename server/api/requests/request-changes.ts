import type { ChangeLine, RequestSnapshot, SnapshotMember } from '@/shared/schemas/requests/snapshot';

type Leaf = ChangeLine['before'];

/** Flattens a JSON value into dotted paths of leaves (arrays by index). */
function flatten(value: unknown, path: string, out: Map<string, Leaf>): void {
  if (value === null || value === undefined) {
    out.set(path, null);
  } else if (Array.isArray(value)) {
    if (value.length === 0) out.set(path, '(none)');
    value.forEach((item, index) => flatten(item, `${path}.${index}`, out));
  } else if (typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) flatten(item, path ? `${path}.${key}` : key, out);
  } else if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') {
    out.set(path, value);
  }
}

/** The results an engineer compares side by side: the summary, spans, reactions, bearing and each check's ratio. */
function memberFacts(member: SnapshotMember) {
  const { result } = member;
  return {
    wall: member.wall,
    input: member.input,
    summary: member.summary,
    result: {
      spans: result.spans,
      reactions: { leftLb: result.reactions.leftLb, rightLb: result.reactions.rightLb },
      bearing: result.bearing,
      checks: Object.fromEntries(result.checks.map((check) => [check.id, check.ratio])),
    },
  };
}

function comparable(snapshot: RequestSnapshot) {
  return {
    engineerEmail: snapshot.engineerEmail,
    job: snapshot.job,
    jurisdiction: snapshot.jurisdiction,
    conditions: snapshot.conditions,
    constraints: snapshot.constraints,
    phoneBack: snapshot.phoneBack,
    questions: snapshot.questions,
    // Keyed by label so a reader sees which member changed; the id keeps two members of one label apart.
    members: Object.fromEntries(
      snapshot.members.map((m) => [`${m.label} (${m.id.slice(0, 8)})`, memberFacts(m)]),
    ),
    files: Object.fromEntries(snapshot.files.map((f) => [f.fileName, `${f.place}: ${f.caption}`])),
    engineVersion: snapshot.engineVersion,
  };
}

/**
 * What changed from one version to the next: every path whose value differs, with the value before and after
 * (null for a path only one side has), in the order of the newer version then the paths it dropped.
 */
export function changesBetween(before: RequestSnapshot, after: RequestSnapshot): ChangeLine[] {
  const old = new Map<string, Leaf>();
  const now = new Map<string, Leaf>();
  flatten(comparable(before), '', old);
  flatten(comparable(after), '', now);
  const lines: ChangeLine[] = [];
  for (const [path, value] of now) {
    const was = old.has(path) ? (old.get(path) ?? null) : null;
    if (!old.has(path) || was !== value) lines.push({ path, before: was, after: value });
  }
  for (const [path, value] of old) if (!now.has(path)) lines.push({ path, before: value, after: null });
  return lines;
}
