import { z } from 'zod';
import { engineerReplySchema } from './reply';
import { changeLineSchema, requestSnapshotSchema } from './snapshot';
import { requestStateSchema } from './workflow';

/**
 * The design request package as JSON: Tributary's own format, versioned. This zod schema is the source;
 * docs/design-request-package.schema.json is generated from it (`npm run schema:request-package`) and
 * docs/design-request-package.md describes it. A change that breaks a reader raises `formatVersion`.
 */
export const REQUEST_PACKAGE_FORMAT = 'tributary.design-request';
/**
 * 2: each member carries its load path to the ground (`request.members[].loadPath`).
 * 3: `changes` are worded lines (group, section, field, before, after, kind) rather than dotted paths.
 */
export const REQUEST_PACKAGE_VERSION = 3;

export const requestPackageSchema = z
  .object({
    format: z.literal(REQUEST_PACKAGE_FORMAT),
    formatVersion: z.literal(REQUEST_PACKAGE_VERSION),
    /** When the package was made, ISO time. */
    generatedAt: z.string(),
    /** The request's state when the package was made. */
    state: requestStateSchema,
    /** The version the package holds (the latest sent), frozen at send. */
    request: requestSnapshotSchema,
    /** What changed from the version before (empty for version 1). */
    changes: z.array(changeLineSchema),
    /** The engineer's latest structured reply and the version it answers, when there is one. */
    reply: z.object({ version: z.number().int(), reply: engineerReplySchema }).nullable(),
  })
  .meta({ title: 'Tributary design request package', id: 'tributary.design-request.v3' });
export type RequestPackage = z.infer<typeof requestPackageSchema>;

/** The JSON Schema of the package, generated from the zod schema (draft 2020-12). */
export function requestPackageJsonSchema() {
  return z.toJSONSchema(requestPackageSchema, {
    target: 'draft-2020-12',
    io: 'output',
    unrepresentable: 'any',
  });
}

/**
 * Reads a package back: the parsed package, or the problems (dotted path: message) that make it not one.
 *
 * @example readRequestPackage(JSON.parse(text)).ok // true for a package Tributary wrote
 */
export function readRequestPackage(
  value: unknown,
): { ok: true; package: RequestPackage } | { ok: false; problems: string[] } {
  const parsed = requestPackageSchema.safeParse(value);
  if (parsed.success) return { ok: true, package: parsed.data };
  return {
    ok: false,
    problems: parsed.error.issues.map((issue) => `${issue.path.join('.') || '(root)'}: ${issue.message}`),
  };
}
