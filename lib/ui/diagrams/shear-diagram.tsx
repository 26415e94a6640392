import { CurveDiagram, type CurveDiagramProps } from './curve-diagram';

/** Shear along the member (lb) under the governing combination, values at the supports and the largest. */
export function ShearDiagram(props: CurveDiagramProps) {
  return <CurveDiagram {...props} kind="shear" />;
}
