import { HttpException } from '@nestjs/common';
import { ProblemType } from './problem-types';

/** One field-level reason, located by a JSON Pointer into the request (RFC 6901). */
export interface FieldProblem {
  pointer: string;
  detail: string;
}

/**
 * The exception every feature throws for an expected failure. The catch-all filter turns it into an
 * `application/problem+json` body; `extensions` become extra members (RFC 9457 section 3.2).
 */
export class ProblemException extends HttpException {
  constructor(
    readonly problemType: ProblemType,
    readonly detail: string,
    readonly fieldErrors: FieldProblem[] = [],
    readonly extensions: Record<string, unknown> = {},
    readonly headers: Record<string, string> = {},
  ) {
    super(detail, problemType.status);
  }
}
