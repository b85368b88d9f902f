// One error type for every refused boundary or grid request: a stable `code` for callers (the
// server maps it to HTTP 400) and a message that says what is wrong, where, and how to fix it.

export type BoundaryErrorCode =
  | 'unreadable'
  | 'unknown-format'
  | 'invalid-geojson'
  | 'unsupported-crs'
  | 'empty'
  | 'no-polygon'
  | 'pick-not-found'
  | 'bad-coordinates'
  | 'short-ring'
  | 'unclosed-ring'
  | 'swapped-coordinates'
  | 'projected-coordinates'
  | 'self-intersection'
  | 'zero-area'
  | 'too-many-vertices'
  | 'cell-size-out-of-range'
  | 'min-fraction-out-of-range'
  | 'too-many-patches'
  | 'no-patches';

export class BoundaryInputError extends Error {
  readonly code: BoundaryErrorCode;

  constructor(code: BoundaryErrorCode, message: string) {
    super(message);
    this.name = 'BoundaryInputError';
    this.code = code;
  }
}
