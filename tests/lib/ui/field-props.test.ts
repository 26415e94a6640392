import { describe, expect, it } from 'vitest';
import { fieldProps } from '@/lib/ui/field-props';
import type { InputFlag } from '@/lib/ui/member/source-draft';

type Draft = {
  clearSpan: string;
  bearingLeft: string;
  flags: Partial<Record<'clearSpan' | 'bearingLeft', InputFlag>>;
};

describe('fieldProps', () => {
  const calls: string[] = [];
  const draft: Draft = { clearSpan: '13-6', bearingLeft: '3', flags: { clearSpan: 'measured' } };
  const set = (key: 'clearSpan' | 'bearingLeft') => (value: string) => calls.push(`set ${key} ${value}`);
  const setFlag = (key: 'clearSpan' | 'bearingLeft', flag: InputFlag) => calls.push(`flag ${key} ${flag}`);
  const errors = { clearSpan: ['Enter the clear span'] };

  it('wires value, setter and messages of the field named', () => {
    const props = fieldProps({ draft, set }, errors, 'clearSpan');
    expect(props.value).toBe('13-6');
    expect(props.errors).toEqual(['Enter the clear span']);
    expect(props.flag).toBeUndefined();
    props.onChangeText('14');
    expect(calls.pop()).toBe('set clearSpan 14');
  });

  it("wires the field's flag where the form keeps flags (default when none is set)", () => {
    expect(fieldProps({ draft, set, setFlag }, errors, 'clearSpan').flag).toBe('measured');
    const bearing = fieldProps({ draft, set, setFlag }, errors, 'bearingLeft');
    expect([bearing.flag, bearing.errors]).toEqual(['default', undefined]);
    bearing.onFlag?.('assumed');
    expect(calls.pop()).toBe('flag bearingLeft assumed');
  });

  it('hands the same flag handler to a field on every render, one per field (memoised fields skip renders)', () => {
    const first = fieldProps({ draft, set, setFlag }, errors, 'clearSpan').onFlag;
    const again = fieldProps(
      { draft: { ...draft, clearSpan: '14' }, set, setFlag },
      errors,
      'clearSpan',
    ).onFlag;
    const other = fieldProps({ draft, set, setFlag }, errors, 'bearingLeft').onFlag;
    expect(again).toBe(first);
    expect(other).not.toBe(first);
    again?.('default');
    expect(calls.pop()).toBe('flag clearSpan default');
  });
});
