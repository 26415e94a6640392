import type { z } from 'zod';
import { boundedRecords } from '@/shared/schemas/bounded-record';

interface Def {
  type: string;
  element?: z.ZodType;
  shape?: Record<string, z.ZodType>;
  keyType?: z.ZodType;
  valueType?: z.ZodType;
  innerType?: z.ZodType;
  in?: z.ZodType;
  out?: z.ZodType;
  options?: z.ZodType[];
  left?: z.ZodType;
  right?: z.ZodType;
  items?: z.ZodType[];
  rest?: z.ZodType | null;
  getter?: () => z.ZodType;
  checks?: { _zod: { def: { check: string; maximum?: number } } }[];
}

const internals = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod;

/** True when a `.max(n)` check (length for arrays, size for sets and maps) sits on the schema. */
const hasMaximum = (def: Def) =>
  (def.checks ?? []).some(
    (check) =>
      ['max_length', 'max_size'].includes(check._zod.def.check) && Number.isFinite(check._zod.def.maximum),
  );

/** Keys from a fixed list (an enum or literal) bound a record by themselves. */
const FINITE_KEYS = new Set(['enum', 'literal']);

/**
 * Paths inside `schema` of every array without a maximum length and every record without a limit on its
 * entries (a free-text key and no `boundedRecord`). `[]` means every collection in it is bounded.
 */
export function unboundedCollections(
  schema: z.ZodType,
  path = '(root)',
  seen = new Set<z.ZodType>(),
): string[] {
  if (seen.has(schema)) return [];
  seen.add(schema);
  const { def } = internals(schema);
  const inner = (child: z.ZodType | null | undefined, at: string) =>
    child ? unboundedCollections(child, at, seen) : [];
  switch (def.type) {
    case 'array': {
      const own = hasMaximum(def) ? [] : [`${path}: array without a maximum`];
      return [...own, ...inner(def.element, `${path}[]`)];
    }
    case 'set':
    case 'map':
      return hasMaximum(def) ? inner(def.valueType, `${path}{}`) : [`${path}: ${def.type} without a maximum`];
    case 'record': {
      const keyType = def.keyType ? internals(def.keyType).def.type : '';
      const bounded = FINITE_KEYS.has(keyType) || boundedRecords.has(schema);
      const own = bounded ? [] : [`${path}: record without a limit on its entries`];
      return [...own, ...inner(def.valueType, `${path}{}`)];
    }
    case 'object':
      return Object.entries(def.shape ?? {}).flatMap(([key, child]) => inner(child, `${path}.${key}`));
    case 'union':
      return (def.options ?? []).flatMap((option, i) => inner(option, `${path}|${i}`));
    case 'intersection':
      return [...inner(def.left, path), ...inner(def.right, path)];
    case 'tuple':
      return [
        ...(def.items ?? []).flatMap((item, i) => inner(item, `${path}[${i}]`)),
        ...inner(def.rest, `${path}[...]`),
      ];
    case 'pipe':
      return [...inner(def.in, path), ...inner(def.out, path)];
    case 'lazy':
      return inner(def.getter?.(), path);
    default:
      return inner(def.innerType, path);
  }
}
