import { describe, expect, it } from 'vitest';
import { cardFields, type CardName } from '@/lib/ui/member/card-memo';

/** The lists each card was memoised on before they were derived from one table. */
const HAND_WRITTEN: Record<CardName, { keys: string[]; errorPrefixes: string[] }> = {
  basics: { keys: ['kind', 'label', 'wall'], errorPrefixes: ['kind', 'label', 'wall'] },
  span: {
    keys: [
      'clearSpan',
      'measuredTo',
      'bearingLeft',
      'bearingRight',
      'overhangLeft',
      'overhangRight',
      'continuous',
      'secondSpan',
      'centreBearing',
      'flags',
    ],
    errorPrefixes: [
      'clearSpan',
      'bearingLeft',
      'bearingRight',
      'overhangLeft',
      'overhangRight',
      'secondSpan',
      'centreBearing',
    ],
  },
  loads: {
    keys: ['edition', 'groundSnow', 'thermal', 'roofPitch', 'sources', 'flags'],
    errorPrefixes: ['groundSnow', 'roofPitch', 'sources'],
  },
  material: {
    keys: ['materialId', 'sizeId', 'gradeUnknown', 'selfWeight'],
    errorPrefixes: ['materialId', 'sizeId'],
  },
  conditions: {
    keys: [
      'braced',
      'unbracedLength',
      'deflectionUse',
      'deflectionCap',
      'mount',
      'joistDepth',
      'underJoistsHeight',
      'atticClearance',
      'supportKind',
      'supportWidth',
      'plateMaterialId',
      'wetService',
      'temperature',
      'posts',
      'flags',
    ],
    errorPrefixes: [
      'unbracedLength',
      'deflectionCap',
      'joistDepth',
      'underJoistsHeight',
      'atticClearance',
      'supportWidth',
      'temperature',
      'posts',
    ],
  },
};

describe('cardFields', () => {
  it.each(Object.keys(HAND_WRITTEN) as CardName[])(
    '%s: the same fields and message paths as before',
    (card) => {
      const derived = cardFields(card);
      expect([...derived.keys].sort()).toEqual([...HAND_WRITTEN[card].keys].sort());
      expect([...derived.errorPrefixes].sort()).toEqual([...HAND_WRITTEN[card].errorPrefixes].sort());
    },
  );
});
