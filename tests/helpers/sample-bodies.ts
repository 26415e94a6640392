import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import {
  passwordResetRequestSchema,
  passwordResetSchema,
  signInSchema,
  signUpSchema,
} from '@/shared/schemas/auth';
import type { MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { memberCheckRequestSchema } from '@/shared/schemas/calc/requests';
import { shortlistInputSchema } from '@/shared/schemas/calc/shortlist';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';
import { jobCreateSchema, jobPatchSchema } from '@/shared/schemas/jobs';
import { memberCreateSchema, memberPatchSchema } from '@/shared/schemas/members';
import {
  bearingSetSchema,
  elementCreateSchema,
  elementPatchSchema,
} from '@/shared/schemas/load-path-elements';
import { acceptInvitationSchema, createInvitationSchema } from '@/shared/schemas/orgs';
import { requestComposeSchema, requestPatchSchema } from '@/shared/schemas/requests/compose';
import { engineerReplySchema } from '@/shared/schemas/requests/reply';
import { acceptRequestInvitationSchema } from '@/shared/schemas/requests/views';
import {
  feeQuoteSchema,
  messageCreateSchema,
  revisionSchema,
  statusChangeSchema,
} from '@/shared/schemas/requests/workflow';
import { screenCreateSchema, screenPatchSchema } from '@/shared/schemas/bearing-screens';
import { checklistItemPatchSchema, engineerItemPatchSchema } from '@/shared/schemas/job-checklist';
import { shoringPlanPutSchema } from '@/shared/schemas/shoring-plans';
import { memberBudgetSaveSchema, sendBudgetSchema } from '@/shared/schemas/budgets';
import {
  priceBookSettingsSchema,
  priceImportSchema,
  pricePatchSchema,
  priceSetSchema,
} from '@/shared/schemas/price-book';
import { signUpBody } from './server';

/** Invented demo header: 2-ply 2x10 Douglas Fir-Larch No.2 over 6 ft, under 13 ft of roof and 6 ft of ceiling. */
export const SAMPLE_HEADER: MemberCheckInputBody = {
  kind: 'header',
  edition: 'ASCE 7-22',
  clearSpanFt: 6,
  sources: [
    { kind: 'roof', tributaryFt: 13, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'ceiling', tributaryFt: 6, deadPsf: 10, livePsf: 10 },
  ],
  materialId: 'sawn-douglas-fir-larch-no2',
  sizeId: '2-ply-2x10',
};

let counter = 0;
const unique = () => `${Date.now()}-${(counter += 1)}`;

/**
 * A valid body for each request schema a route validates, made fresh on each call. A route whose body
 * schema is missing here cannot be tried by the access matrix or the hostile-body tests: add one.
 */
export const SAMPLE_BODIES = new Map<z.ZodType, () => unknown>([
  [signUpSchema, () => signUpBody()],
  [signInSchema, () => ({ email: `nobody-${unique()}@example.test`, password: 'not the password' })],
  [passwordResetRequestSchema, () => ({ email: `forgetful-${unique()}@example.test` })],
  [passwordResetSchema, () => ({ password: 'a brand new passphrase' })],
  [createInvitationSchema, () => ({ email: `invitee-${unique()}@example.test`, role: 'estimator' })],
  [acceptInvitationSchema, () => ({ name: 'Invited Person', password: 'a long enough password' })],
  // A device-chosen id, as the offline queue sends it (docs/sync-protocol.md).
  [jobCreateSchema, () => ({ id: randomUUID(), name: `Sample job ${unique()}`, stories: 2 })],
  [jobPatchSchema, () => ({ notes: `Patched ${unique()}` })],
  [memberCreateSchema, () => ({ label: `Sample member ${unique()}`, input: SAMPLE_HEADER })],
  [memberPatchSchema, () => ({ wall: `Wall ${unique()}` })],
  [
    elementCreateSchema,
    () => ({
      label: `Sample post ${unique()}`,
      element: { kind: 'post', materialId: 'sawn-douglas-fir-larch-no2', sizeId: '6x6', heightFt: 7 },
    }),
  ],
  [elementPatchSchema, () => ({ label: `Renamed element ${unique()}` })],
  [
    bearingSetSchema,
    () => ({
      onto: {
        label: `Sample pad ${unique()}`,
        element: { kind: 'footing', data: { footing: 'new-pad', confirmed: true } },
      },
    }),
  ],
  [memberCheckRequestSchema, () => ({ ...SAMPLE_HEADER, diagrams: false })],
  [
    shortlistInputSchema,
    () => ({
      kind: 'header',
      edition: 'ASCE 7-22',
      clearSpanFt: 6,
      sources: SAMPLE_HEADER.sources,
      materialIds: ['sawn-douglas-fir-larch-no2'],
    }),
  ],
  [
    spanTableInputSchema,
    () => ({
      edition: 'ASCE 7-22',
      deadPsf: 12,
      livePsf: 40,
      tributaryWidthsFt: [4, 8],
      materialIds: ['sawn-douglas-fir-larch-no2'],
      plies: [2],
    }),
  ],
  [
    screenCreateSchema,
    () => ({
      wallLabel: `Sample wall ${unique()}`,
      answers: { sag: { value: 'no', basis: 'seen' }, joistSpanAFt: 12 },
    }),
  ],
  [screenPatchSchema, () => ({ answers: { bracedWall: { value: 'unsure' } } })],
  [checklistItemPatchSchema, () => ({ state: 'done', note: `Checked ${unique()}` })],
  [engineerItemPatchSchema, () => ({ state: 'done', note: `Verified ${unique()}` })],
  [
    shoringPlanPutSchema,
    () => ({
      layout: 'both-sides',
      joistSpanAFt: 12,
      joistSpanBFt: 10,
      studs: {
        materialId: 'sawn-spruce-pine-fir-no1-no2',
        studSizeId: '2x4',
        studSpacingIn: 16,
        heightFt: 8,
      },
      standsOn: 'floor-framing-perpendicular',
    }),
  ],
  [requestComposeSchema, () => ({ questions: `Sample question ${unique()}` })],
  [requestPatchSchema, () => ({ questions: `Patched question ${unique()}` })],
  [revisionSchema, () => ({ note: `Revised ${unique()}` })],
  [statusChangeSchema, () => ({ to: 'in-review' })],
  [feeQuoteSchema, () => ({ feeUsd: 500, turnaroundDays: 5 })],
  [
    engineerReplySchema,
    () => ({
      members: [{ memberId: 'sample-member', material: 'lvl', designation: '2-ply 1-3/4 x 9-1/4 LVL' }],
    }),
  ],
  [messageCreateSchema, () => ({ body: `Sample message ${unique()}` })],
  [
    acceptRequestInvitationSchema,
    () => ({ name: 'Invited Engineer', password: 'a long enough password', firmName: 'Sample Structural' }),
  ],
  [priceSetSchema, () => ({ key: 'rate/carpenter', amount: 7000 + (counter += 1), note: 'Sample price' })],
  [pricePatchSchema, () => ({ amount: 7100 + (counter += 1) })],
  [priceBookSettingsSchema, () => ({ staleAfterDays: 60 })],
  [priceImportSchema, () => ({ csv: `key,value,note\r\nmarkup/tax,8.25,Sample ${unique()}\r\n` })],
  [
    memberBudgetSaveSchema,
    () => ({
      choices: { shoring: 'rented', allowances: ['wiring'] },
      overrides: { 'demolition/disposal': { quantity: 2, note: `Two loads ${unique()}` } },
    }),
  ],
  [
    sendBudgetSchema,
    () => ({ clientName: `Sample client ${unique()}`, exclusions: ['Painting the whole room'] }),
  ],
]);

/** A tiny valid PNG (1 x 1, one grey pixel). */
export const SAMPLE_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAAAAAA6fptVAAAACklEQVR4nGNoAAAAggCBd81ytgAAAABJRU5ErkJggg==',
  'base64',
);

/** Multipart routes (no JSON body schema): the fields and the file the access matrix sends them. */
export const SAMPLE_UPLOADS = new Map<string, () => { fields: Record<string, string>; fileName: string }>([
  [
    'POST /api/requests/:requestId/attachments',
    () => ({
      fields: { place: 'attic-over-wall', caption: `Sample photo ${unique()}` },
      fileName: 'sample.png',
    }),
  ],
]);

/** A fresh valid body for `schema`; throws naming `where` when there is no sample for it. */
export function sampleBody(schema: z.ZodType, where: string): unknown {
  const make = SAMPLE_BODIES.get(schema);
  if (!make) throw new Error(`No sample body for ${where}: add one to tests/helpers/sample-bodies.ts`);
  return make();
}
