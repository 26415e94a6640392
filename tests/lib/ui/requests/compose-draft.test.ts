import { describe, expect, it } from 'vitest';
import { draftFromCompose, readComposeDraft } from '@/lib/ui/requests/compose-draft';
import { requestComposeSchema } from '@/shared/schemas/requests/compose';

const empty = () => draftFromCompose();

describe('the compose form’s draft', () => {
  it('round-trips a full working copy, the fields the form added included', () => {
    const compose = requestComposeSchema.parse({
      memberIds: ['m1'],
      engineerEmail: 'pe@example.test',
      jurisdiction: { place: 'Invented County', state: 'OR' },
      constraints: { mount: 'flush', maxDepthIn: 11.875, longestPieceFt: 16 },
      phoneBack: {
        joists: { size: '2x8', spacingIn: 16, species: 'DF', tapeInPhoto: true, flag: 'measured' },
        roofingLayers: 2,
        heavyAbove: ['solar', 'cast-iron-tub'],
        heavyAboveNote: 'Tub over the east end',
        sag: { sagIn: 0.75, stringLine: true, flag: 'assumed' },
        damage: { sistered: true, notched: false, bored: true, rot: false, note: 'Bored for a drain' },
        yardStock: [{ product: '1-3/4 in LVL', eGrade: '2.0E' }],
      },
      questions: 'Can the beam be flush?',
    });
    const reading = readComposeDraft(draftFromCompose(compose));
    expect(reading).toEqual({ ok: true, body: compose });
  });

  it('reads heavy items, damage marks, tape in the photo and yard stock into the body', () => {
    const draft = {
      ...empty(),
      heavyAbove: ['water-heater' as const],
      damage: { sistered: false, notched: true, bored: false, rot: true },
      tapeInPhoto: true,
      yardStock: [
        { product: ' 1-3/4 in LVL ', eGrade: '2.0E' },
        { product: '', eGrade: '' },
      ],
    };
    const reading = readComposeDraft(draft);
    if (!reading.ok) throw new Error(JSON.stringify(reading.errors));
    expect(reading.body.phoneBack.heavyAbove).toEqual(['water-heater']);
    expect(reading.body.phoneBack.damage).toMatchObject({ notched: true, rot: true, sistered: false });
    expect(reading.body.phoneBack.joists.tapeInPhoto).toBe(true);
    // An empty row is dropped; the product's spaces are trimmed.
    expect(reading.body.phoneBack.yardStock).toEqual([{ product: '1-3/4 in LVL', eGrade: '2.0E' }]);
  });

  it('names each bad field: a number in letters, a grade without its product, a bad e-mail', () => {
    const draft = empty();
    draft.text['constraints.maxDepthIn'] = 'twelve';
    draft.text['phoneBack.sag.sagIn'] = '30';
    draft.text.engineerEmail = 'not an address';
    draft.yardStock = [{ product: '', eGrade: '2.0E' }];
    const reading = readComposeDraft(draft);
    if (reading.ok) throw new Error('expected field errors');
    expect(reading.errors['constraints.maxDepthIn']).toEqual(['Enter a number, like 16 or 9.5']);
    expect(reading.errors['phoneBack.yardStock.0.product']?.[0]).toMatch(/Name the product/);
    expect(reading.errors['phoneBack.sag.sagIn']).toEqual(['At most 24 in']);
    expect(reading.errors.engineerEmail?.length).toBeGreaterThan(0);
  });

  it('an untouched form is a valid empty Draft', () => {
    expect(readComposeDraft(empty())).toEqual({ ok: true, body: requestComposeSchema.parse({}) });
  });
});
