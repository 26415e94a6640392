import fc from 'fast-check';
import type { z } from 'zod';

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  element?: z.ZodType;
  valueType?: z.ZodType;
  innerType?: z.ZodType;
  in?: z.ZodType;
  out?: z.ZodType;
  options?: z.ZodType[];
  left?: z.ZodType;
  right?: z.ZodType;
  items?: z.ZodType[];
  entries?: Record<string, string | number>;
  values?: unknown[];
  getter?: () => z.ZodType;
  checks?: { _zod: { def: { check: string; maximum?: number } } }[];
}

const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod.def;

const maxOf = (def: Def) =>
  def.checks?.map((check) => check._zod.def).find((check) => check.check === 'max_length')?.maximum;

/** Keys that have broken servers before: prototype pollution and inherited names. */
const POISON_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf'];

/** Strings that look empty, break encodings or confuse parsers. */
const NASTY_STRINGS = [
  '',
  ' ',
  '\u200b\u3164\u2800',
  '\u0000',
  '\ud800',
  '%ZZ',
  '../../etc/passwd',
  "'; DROP TABLE jobs; --",
  '<script>alert(1)</script>',
  '{{7*7}}',
  '1e309',
  'NaN',
  '__proto__',
];

/** Numbers at the edges of what JSON carries. */
const NASTY_NUMBERS = [0, -0, 1, -1, 0.5, -1e-9, 2 ** 53 + 1, 1e308, -1e308, 5e-324];

/** A value of the wrong kind for anything. */
export const junk: fc.Arbitrary<unknown> = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.integer(),
  fc.constantFrom(...NASTY_NUMBERS),
  fc.constantFrom(...NASTY_STRINGS),
  fc.constant([]),
  fc.constant({}),
  fc.array(fc.integer(), { maxLength: 3 }),
);

function longer(max: number | undefined): fc.Arbitrary<string> {
  return max === undefined ? fc.string({ minLength: 1, maxLength: 400 }) : fc.constant('x'.repeat(max + 1));
}

/**
 * Bodies for `schema` that a hostile client would send: each field the right kind of value, a value at or
 * past its limits, a wrong kind, or missing; objects with poisoned extra keys; arrays up to and past their
 * maximum length. Derived from the zod schema's own structure, so a new field is covered without a line
 * here. Some values come out valid: callers judge each body with the schema itself.
 */
export function hostileValue(schema: z.ZodType, depth = 0): fc.Arbitrary<unknown> {
  if (depth > 6) return junk;
  const def = defOf(schema);
  const child = (inner: z.ZodType | undefined) => (inner ? hostileValue(inner, depth + 1) : junk);
  switch (def.type) {
    case 'object': {
      const shape = def.shape ?? {};
      const fields = fc.record(
        Object.fromEntries(Object.entries(shape).map(([key, value]) => [key, child(value)])),
        { requiredKeys: [] },
      );
      const extras = fc.dictionary(fc.constantFrom(...POISON_KEYS, 'unexpected'), junk, { maxKeys: 2 });
      const object = fc.tuple(fields, extras).map(([own, extra]) => ({ ...extra, ...own }));
      return fc.oneof({ weight: 8, arbitrary: object }, { weight: 1, arbitrary: junk });
    }
    case 'array': {
      const max = maxOf(def);
      const element = child(def.element);
      const sizes = fc.oneof(
        fc.array(element, { maxLength: Math.min(max ?? 4, 4) }),
        ...(max === undefined ? [] : [fc.array(element, { minLength: max + 1, maxLength: max + 1 })]),
      );
      return fc.oneof({ weight: 6, arbitrary: sizes }, { weight: 1, arbitrary: junk });
    }
    case 'record':
      return fc.oneof(
        fc.dictionary(fc.string({ maxLength: 12 }), child(def.valueType), { maxKeys: 5 }),
        junk,
      );
    case 'string':
      return fc.oneof(
        fc.string({ maxLength: 24 }),
        fc.constantFrom(...NASTY_STRINGS),
        longer(maxOf(def)),
        fc.emailAddress(),
        junk,
      );
    case 'number':
      return fc.oneof(
        fc.integer({ min: -1000, max: 1000 }),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.constantFrom(...NASTY_NUMBERS),
        junk,
      );
    case 'boolean':
      return fc.oneof(fc.boolean(), fc.constantFrom('true', 1, 0), junk);
    case 'enum':
      return fc.oneof(fc.constantFrom(...Object.values(def.entries ?? { none: 'none' })), junk);
    case 'literal':
      return fc.oneof(fc.constantFrom(...(def.values ?? [null])), junk);
    case 'union':
      return fc.oneof(...(def.options ?? []).map((option) => child(option)), junk);
    case 'intersection':
      return fc.oneof(child(def.left), child(def.right));
    case 'tuple':
      return fc.oneof(fc.tuple(...(def.items ?? []).map((item) => child(item))), junk);
    case 'pipe':
      return fc.oneof(child(def.in), child(def.out));
    case 'lazy':
      return child(def.getter?.());
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'readonly':
    case 'catch':
    case 'nonoptional':
      return fc.oneof(child(def.innerType), fc.constant(null));
    default:
      return junk;
  }
}

/** The object schema under wrappers (optional, default, pipe …), or undefined. */
function objectShape(schema: z.ZodType): Record<string, z.ZodType> | undefined {
  const def = defOf(schema);
  if (def.type === 'object') return def.shape;
  const inner = def.innerType ?? def.out;
  return inner ? objectShape(inner) : undefined;
}

/**
 * `valid` with one field, at any depth of its objects, replaced by a hostile value of that field's schema
 * or left out: bodies one mistake away from valid, many of which the schema accepts, so they reach the
 * service and the engine behind it.
 */
export function oneFieldOff(schema: z.ZodType, valid: Record<string, unknown>): fc.Arbitrary<unknown> {
  const shape = objectShape(schema) ?? {};
  const keys = Object.keys(shape);
  if (keys.length === 0) return fc.constant(valid);
  return fc.constantFrom(...keys).chain((key) => {
    const field = shape[key];
    const current = valid[key];
    const nested =
      typeof current === 'object' && current !== null && !Array.isArray(current) && objectShape(field)
        ? [oneFieldOff(field, current as Record<string, unknown>)]
        : [];
    return fc
      .oneof(hostileValue(field, 1), fc.constant(undefined), ...nested)
      .map((value) => ({ ...valid, [key]: value }));
  });
}
