import { describe, expect, it } from 'vitest';
import { layoutCurve } from '@/lib/ui/diagrams/curve-layout';
import { curveText, loadDiagramText } from '@/lib/ui/diagrams/diagram-text';
import type { CurveKind } from '@/lib/ui/diagrams/value-text';
import { busyBody, check, fixtureBody, headerBody } from './cases';

const KINDS: CurveKind[] = ['shear', 'moment', 'deflection'];

describe('loadDiagramText', () => {
  it('names the spans, bearings, every load at the position entered, and the reactions (fixture)', () => {
    const text = loadDiagramText(check(fixtureBody));
    expect(text).toContain(`Clear span 14' 0" between support faces`);
    expect(text).toContain(`design span 14' 4-1/2" between bearing centres`);
    expect(text).toContain('4-1/2" bearing at each end');
    // the fixture's floor: 12 ft × 12 psf dead, 12 ft × 40 psf live
    expect(text).toContain('Floor: dead 144 plf + live 480 plf = 624 plf over the full span.');
    expect(text).toContain(`Wall above: dead 48 plf from 0" to 6' 0" from the left support face.`);
    expect(text).toContain(
      `Post above: dead 600 lb + live 900 lb = 1,500 lb at 9' 0" from the left support face.`,
    );
    expect(text).toContain('Largest reactions (D + L): 5,381 lb at the left, 5,638 lb at the right.');
  });

  it('does not add roof live and snow into one number', () => {
    const text = loadDiagramText(check(busyBody));
    // roof 8 ft: 15 psf dead, 20 psf roof live, and the sloped-roof snow of the engine's snow module
    expect(text).toMatch(/Roof: dead 120 plf, roof live 160 plf, snow \d[\d,]* plf over the full span\./);
    expect(text).toContain('3" bearing at the left end and 6" at the right');
  });
});

describe('curveText', () => {
  it.each(KINDS)('%s: says every value the drawing labels, and the combination', (kind) => {
    for (const body of [fixtureBody, busyBody, headerBody]) {
      const result = check(body);
      const text = curveText(result, kind);
      expect(text).toContain(`under ${result.diagram?.combination}`);
      for (const label of layoutCurve(result, kind, 280)?.labels ?? []) expect(text).toContain(label.text);
    }
  });

  it('places the largest moment and deflection from the support face (header, centre of a uniform load)', () => {
    const result = check(headerBody);
    // symmetric uniform load: the peaks are at mid-span, 3 ft from the face of a 6 ft clear opening
    expect(curveText(result, 'moment')).toMatch(/largest [\d,]+ lb·ft at 3' 0" from the left support face/);
    expect(curveText(result, 'deflection')).toMatch(
      /largest 0\.\d+ in downward at 3' 0" from the left support face/,
    );
    expect(curveText(result, 'shear')).toContain('(the largest in size)');
  });

  it('says so when the result carries no samples', () => {
    const { diagram: _omitted, ...plain } = check(headerBody);
    expect(curveText(plain, 'moment')).toBe('Bending moment: not computed for this result.');
  });
});
