import type { DiagramSample, SpanModel } from './span-model';

/**
 * Samples shear, moment and deflection for drawing: `points` evenly spaced stations, every breakpoint (a
 * point load gives two samples at the same x, the shear just before and just after it), and the stations of
 * the largest moment and deflection so the drawn peaks are the true ones.
 *
 * @param model any SpanModel (ft, lb, lb·ft, in)
 * @param points evenly spaced stations including both ends, ≥ 2; default 41
 * @returns samples sorted by xFt
 * @example
 * sampleDiagram(createSimpleSpan({ spanFt: 10, eiLbIn2: 7.6e7, loads: [{ kind: 'uniform', wPlf: 100 }] }), 11);
 *
 * Reference: AWC Design Aid No. 6 (2007), shear, moment and deflection diagrams.
 */
export function sampleDiagram(model: SpanModel, points = 41): DiagramSample[] {
  const n = Math.max(2, Math.floor(points));
  const L = model.spanFt;
  const xs = new Set<number>();
  for (let i = 0; i < n; i++) xs.add((L * i) / (n - 1));
  for (const x of model.breakpointsFt()) xs.add(x);
  xs.add(model.maxMoment().atFt);
  xs.add(model.maxDeflection().atFt);
  const samples: DiagramSample[] = [];
  for (const x of [...xs].sort((a, b) => a - b)) {
    const before = model.shearLb(x, 'before');
    const after = model.shearLb(x, 'after');
    const momentLbFt = model.momentLbFt(x);
    const deflectionIn = model.deflectionIn(x);
    if (x > 0 && before !== after) samples.push({ xFt: x, shearLb: before, momentLbFt, deflectionIn });
    samples.push({ xFt: x, shearLb: x < L ? after : before, momentLbFt, deflectionIn });
  }
  return samples;
}
