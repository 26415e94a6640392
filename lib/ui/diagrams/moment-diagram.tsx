import { CurveDiagram, type CurveDiagramProps } from './curve-diagram';

/** Bending moment along the member (lb·ft) under the governing combination, its largest value labelled. */
export function MomentDiagram(props: CurveDiagramProps) {
  return <CurveDiagram {...props} kind="moment" />;
}
