import { z } from 'zod';

/** Unit a bare number takes in a length field. */
export const lengthUnitSchema = z.enum(['ft', 'in']);
export type LengthUnit = z.infer<typeof lengthUnitSchema>;

/** What a load field holds: an area load (psf), a line load (plf) or a force (lb). */
export const loadKindSchema = z.enum(['psf', 'plf', 'lb']);
export type LoadKind = z.infer<typeof loadKindSchema>;

/** A length as typed ("13' 6\"", "4.1 m") with the field's unit for a bare number; the engine reads it. */
export const lengthEntrySchema = z.object({
  text: z.string().max(40, { message: 'At most 40 characters' }),
  defaultUnit: lengthUnitSchema.default('in'),
});
export type LengthEntry = z.infer<typeof lengthEntrySchema>;

/** A load as typed ("1,500 lb", "2.4 kN/m") with the kind the field holds. */
export const loadEntrySchema = z.object({
  text: z.string().max(40, { message: 'At most 40 characters' }),
  kind: loadKindSchema,
});
export type LoadEntry = z.infer<typeof loadEntrySchema>;
