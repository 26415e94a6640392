import { z } from 'zod';

/**
 * The engineer's structured reply (DESIGN.md §7): per member the designed member, its plies and size, ply
 * fastening, hangers, bearing lengths, posts, footing and connections; for the request the shoring, the
 * items to verify in the field, fee, turnaround and site visit. Lengths in in, fee in US dollars.
 */

const text = (max = 1000) =>
  z
    .string()
    .trim()
    .max(max, { message: `At most ${max} characters` });

/** Wood (sawn, LVL, PSL, glulam), a steel W shape or a flitch beam (steel plate bolted between wood plies). */
export const designedMaterials = ['sawn', 'lvl', 'psl', 'glulam', 'steel-w', 'flitch'] as const;
export const designedMaterialSchema = z.enum(designedMaterials);
export type DesignedMaterial = z.infer<typeof designedMaterialSchema>;

export const DESIGNED_MATERIAL_LABELS: Record<DesignedMaterial, string> = {
  sawn: 'Sawn lumber',
  lvl: 'LVL',
  psl: 'PSL',
  glulam: 'Glulam',
  'steel-w': 'Steel W shape',
  flitch: 'Flitch beam',
};

const inches = z
  .number()
  .positive({ message: 'Enter a value above 0' })
  .max(120, { message: 'At most 120 in' });

/** One designed member, answering the request member `memberId` (its id in the snapshot). */
export const designedMemberSchema = z
  .object({
    memberId: z.string().min(1).max(100),
    material: designedMaterialSchema,
    /** As the engineer writes it: "3-ply 1-3/4 x 11-7/8 LVL 2.0E", "W8x18", "24F-V4 5-1/8 x 12". */
    designation: text(200).refine((value) => value.length > 0, { message: 'Name the member' }),
    plies: z.number().int().min(1).max(6).nullable().default(null),
    widthIn: inches.nullable().default(null),
    depthIn: inches.nullable().default(null),
    grade: text(200).default(''),
    plyFastening: text().default(''),
    hangers: text().default(''),
    bearingLeftIn: inches.nullable().default(null),
    bearingRightIn: inches.nullable().default(null),
    posts: text().default(''),
    footing: text().default(''),
    connections: text().default(''),
  })
  .refine((member) => member.material !== 'steel-w' || member.plies === null || member.plies === 1, {
    path: ['plies'],
    message: 'A W shape is one piece',
  });
export type DesignedMember = z.output<typeof designedMemberSchema>;

/** Something the contractor confirms on site before closing in; `photo` asks for a photo of it. */
export const fieldItemSchema = z.object({
  item: text(300).refine((value) => value.length > 0, { message: 'Say what to verify' }),
  photo: z.boolean().default(false),
});
export type FieldItem = z.output<typeof fieldItemSchema>;

/** `POST /api/requests/:requestId/reply`: answers the request's current version. */
export const engineerReplySchema = z.object({
  members: z.array(designedMemberSchema).min(1, { message: 'Design at least one member' }).max(20),
  shoring: text(2000).default(''),
  verifyInField: z.array(fieldItemSchema).max(40, { message: 'At most 40 items' }).default([]),
  feeUsd: z.number().min(0).max(1_000_000).nullable().default(null),
  turnaroundDays: z.number().int().min(1).max(365).nullable().default(null),
  siteVisit: z.boolean().default(false),
  note: text(5000).default(''),
});
export type EngineerReply = z.output<typeof engineerReplySchema>;
export type EngineerReplyBody = z.input<typeof engineerReplySchema>;
