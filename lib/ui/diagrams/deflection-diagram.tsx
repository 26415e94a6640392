import { CurveDiagram, type CurveDiagramProps } from './curve-diagram';

/** Short-term deflection along the member (in) under the governing combination, drawn downward, its largest value labelled. */
export function DeflectionDiagram(props: CurveDiagramProps) {
  return <CurveDiagram {...props} kind="deflection" />;
}
