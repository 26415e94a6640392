import { describe, expect, it } from 'vitest';
import { sectionFactors } from '@/lib/calc/checks';
import { getSize } from '@/lib/calc/materials';

const DFL_NO2 = 'sawn-douglas-fir-larch-no2';
const repetitive = {
  wetService: false,
  temperatureF: 70,
  incised: false,
  flatUse: false,
  repetitive: true,
};

describe('repetitive member factor in the section factors (NDS 2018 §4.3.9)', () => {
  it('dimension lumber 2 in to 4 in thick takes C_r = 1.15 (NDS 2018 §4.3.9)', () => {
    expect(sectionFactors(DFL_NO2, getSize(DFL_NO2, '2x10'), 12, repetitive).Cr).toBe(1.15);
    expect(sectionFactors(DFL_NO2, getSize(DFL_NO2, '4x10'), 12, repetitive).Cr).toBe(1.15);
  });

  it('a timber 5 in and thicker never takes C_r, even when asked (NDS 2018 §4.3.9: dimension lumber only)', () => {
    expect(sectionFactors(DFL_NO2, getSize(DFL_NO2, '6x10'), 12, repetitive).Cr).toBe(1);
  });
});
