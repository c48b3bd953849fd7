import { HttpException } from '@nestjs/common';
import type { ProblemBody } from './problem-body';

/**
 * A stored problem answer replayed for an idempotent retry: the client gets exactly the first answer
 * (same status, same body, including the first request's id).
 */
export class ReplayedProblemException extends HttpException {
  constructor(readonly storedBody: ProblemBody) {
    super(storedBody.detail, storedBody.status);
  }
}
