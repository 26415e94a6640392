import { describe, expect, it } from 'vitest';
import { changeBaseline, designChange, type BudgetBaseline } from '@/lib/budget';

// Dressed sizes from the NDS Supplement (2018) Table 1B: a 2x10 is 1-1/2 x 9-1/4 in, so 2 plies are 3 in
// wide. LVL plies are 1-3/4 in (common practice). Money is invented.
const budgeted: BudgetBaseline = {
  label: '2-ply 2x10 Douglas Fir-Larch No.2',
  family: 'Sawn lumber',
  plies: 2,
  bIn: 3,
  dIn: 9.25,
  lowCents: 4_000_00,
  highCents: 4_500_00,
  against: 'the preliminary range',
  sentBudgetId: null,
};

describe('designChange: the change order between the budgeted and the designed member', () => {
  it('is null for the member that was budgeted (within 1/32 in)', () => {
    expect(designChange(budgeted, { ...budgeted, dIn: 9.25 + 1 / 64, totalCents: 4_100_00 })).toBeNull();
  });

  it('names every way the member differs and prices the difference against both ends of the range', () => {
    const change = designChange(budgeted, {
      label: '3-ply 1-3/4 x 11-7/8 LVL 2.0E',
      family: 'LVL',
      plies: 3,
      bIn: 5.25,
      dIn: 11.875,
      totalCents: 5_200_00,
    });
    expect(change).toEqual({
      against: 'the preliminary range',
      sentBudgetId: null,
      budgetedLabel: '2-ply 2x10 Douglas Fir-Larch No.2',
      designedLabel: '3-ply 1-3/4 x 11-7/8 LVL 2.0E',
      differences: [
        'material Sawn lumber → LVL',
        'plies 2 → 3',
        'width 3" → 5-1/4"',
        'depth 9-1/4" → 11-7/8"',
      ],
      designedCents: 5_200_00,
      fromHighCents: 700_00,
      fromLowCents: 1_200_00,
      outsideRange: true,
    });
  });

  it('a deeper member inside the range still raises the flag, with the cost inside it', () => {
    const change = designChange(budgeted, {
      ...budgeted,
      label: '2-ply 2x12',
      dIn: 11.25,
      totalCents: 4_300_00,
    });
    expect(change?.differences).toEqual(['depth 9-1/4" → 11-1/4"']);
    expect(change).toMatchObject({ fromHighCents: -200_00, fromLowCents: 300_00, outsideRange: false });
  });

  it('a cheaper design shows a credit; dimensions the engineer left out are not compared', () => {
    const change = designChange(budgeted, {
      label: 'W8x18',
      family: 'Steel W shape',
      plies: null,
      bIn: null,
      dIn: null,
      totalCents: 3_900_00,
    });
    expect(change?.differences).toEqual(['material Sawn lumber → Steel W shape']);
    expect(change).toMatchObject({ fromHighCents: -600_00, fromLowCents: -100_00, outsideRange: true });
  });
});

describe('changeBaseline: the budget a change order compares with', () => {
  const lvl = {
    label: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
    family: 'LVL',
    plies: 2,
    bIn: 3.5,
    dIn: 9.25,
  };
  const sent = {
    id: 'sent-1',
    clientName: 'Sample Homeowner',
    sentAt: '2026-11-30T15:04:00.000Z',
    shape: lvl,
    lowCents: 4_800_00,
    highCents: 4_800_00,
  };

  it('without a sent budget: the preliminary range, said so', () => {
    expect(changeBaseline(budgeted, null)).toEqual(budgeted);
  });

  it('with one: its member and range, named by client and date (common practice: priced against what the client was given)', () => {
    expect(changeBaseline(budgeted, sent)).toEqual({
      ...lvl,
      lowCents: 4_800_00,
      highCents: 4_800_00,
      against: 'the budget sent to Sample Homeowner on 2026-11-30',
      sentBudgetId: 'sent-1',
    });
  });

  it('the sent member designed as budgeted: no change order, though it differs from the preliminary size', () => {
    const designed = { ...lvl, totalCents: 4_950_00 };
    expect(designChange(changeBaseline(budgeted, sent), designed)).toBeNull();
    expect(designChange(changeBaseline(budgeted, null), designed)?.differences).toEqual([
      'material Sawn lumber → LVL',
      'width 3" → 3-1/2"',
    ]);
  });

  it('a deeper member than the sent one: the difference in money is against the sent budget', () => {
    const change = designChange(changeBaseline(budgeted, sent), {
      ...lvl,
      label: '2-ply 1-3/4 x 11-7/8 LVL 2.0E',
      dIn: 11.875,
      totalCents: 5_150_00,
    });
    expect(change).toEqual({
      against: 'the budget sent to Sample Homeowner on 2026-11-30',
      sentBudgetId: 'sent-1',
      budgetedLabel: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
      designedLabel: '2-ply 1-3/4 x 11-7/8 LVL 2.0E',
      differences: ['depth 9-1/4" → 11-7/8"'],
      designedCents: 5_150_00,
      fromHighCents: 350_00,
      fromLowCents: 350_00,
      outsideRange: true,
    });
  });
});
