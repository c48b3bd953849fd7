/** Why an uploaded table was refused; the datasets service turns this into problem details. */
export type IngestErrorCode =
  | 'empty-file'
  | 'missing-header'
  | 'empty-header'
  | 'duplicate-header'
  | 'wrong-delimiter'
  | 'malformed-row'
  | 'no-data-rows'
  | 'too-many-columns'
  | 'not-utf8';

export class IngestError extends Error {
  constructor(
    readonly code: IngestErrorCode,
    message: string,
    readonly details: { rows?: number[]; columns?: string[] } = {},
  ) {
    super(message);
    this.name = 'IngestError';
  }
}
