import type { ReactElement } from 'react';

import type { PatchLayerProps } from './patchLayerTypes';
import { StatePathsLayer } from './StatePathsLayer';

/** Native: vector paths at every size (there is no offscreen canvas). */
export function PatchLayer(props: PatchLayerProps): ReactElement {
  return <StatePathsLayer {...props} />;
}
