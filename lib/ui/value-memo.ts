import { memo, type FunctionComponent } from 'react';
import { jsonEqual } from './json-equal';

/**
 * React.memo comparing props by value (jsonEqual): for components drawn from plain result data, which a new
 * check hands over as new objects even where the numbers are the same. Only for data props: callbacks
 * count as absent, so a component taking one must not use this.
 */
export function valueMemo<P extends object>(component: FunctionComponent<P>) {
  return memo(component, (a, b) => jsonEqual(a, b));
}
