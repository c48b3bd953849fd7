import { CallHandler, ExecutionContext, HttpStatus, Injectable, NestInterceptor } from '@nestjs/common';
import { HttpException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { HTTP_CODE_METADATA } from '@nestjs/common/constants';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { createHash } from 'node:crypto';
import { catchError, from, mergeMap, Observable, of, throwError } from 'rxjs';
import { buildProblem, ProblemBody } from '../problem-details/problem-body';
import { ReplayedProblemException } from '../problem-details/replayed-problem.exception';
import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';
import { principalOf } from '../public-api/public-principal';
import { IdempotencyService } from './idempotency.service';

const KEY_PATTERN = /^[\x21-\x7e]{1,255}$/;

/**
 * The request fingerprint: method, route and the parsed body (JSON) or, for streamed uploads, the query,
 * content type and declared length (the stream itself is read only once, by the handler).
 */
export function requestFingerprint(request: FastifyRequest): string {
  const hash = createHash('sha256');
  hash.update(`${request.method}\u0000${request.routeOptions.url ?? request.url}\u0000`);
  if (request.body !== undefined && request.body !== null && !isStream(request.body)) {
    hash.update(Buffer.isBuffer(request.body) ? request.body : JSON.stringify(request.body));
  } else {
    hash.update(`${JSON.stringify(request.query ?? {})}\u0000${request.headers['content-type'] ?? ''}\u0000${request.headers['content-length'] ?? ''}`);
  }
  return hash.digest('hex');
}

function isStream(value: unknown): boolean {
  return typeof (value as { pipe?: unknown }).pipe === 'function';
}

/** Answers worth keeping: success and the client's own mistakes. Throttling and server faults may be retried. */
function isFinalStatus(status: number): boolean {
  return status < 500 && status !== HttpStatus.TOO_MANY_REQUESTS && status !== HttpStatus.CONFLICT;
}

@Injectable()
export class IdempotentInterceptor implements NestInterceptor {
  constructor(
    private readonly idempotency: IdempotencyService,
    private readonly reflector: Reflector,
  ) {}

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const request = context.switchToHttp().getRequest<FastifyRequest>();
    const reply = context.switchToHttp().getResponse<FastifyReply>();
    const header = request.headers['idempotency-key'];
    const principal = principalOf(request);
    if (request.method !== 'POST' || header === undefined || !principal) return next.handle();
    const key = Array.isArray(header) ? header[0] ?? '' : header;
    if (!KEY_PATTERN.test(key)) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'Idempotency-Key must be 1 to 255 visible ASCII characters.', [
        { pointer: '#/headers/idempotency-key', detail: 'invalid key' },
      ]);
    }
    const claim = await this.idempotency.claim(principal.teamId, key, requestFingerprint(request));
    if (claim.kind === 'replay') {
      if (claim.status >= 400) throw new ReplayedProblemException(claim.body as ProblemBody);
      void reply.header('idempotency-replayed', 'true');
      return of(claim.body);
    }
    const successStatus =
      this.reflector.get<number | undefined>(HTTP_CODE_METADATA, context.getHandler()) ?? HttpStatus.CREATED;
    return next.handle().pipe(
      mergeMap((body) => from(this.idempotency.complete(principal.teamId, key, successStatus, body).then(() => body))),
      catchError((error: unknown) => {
        const status = error instanceof HttpException ? error.getStatus() : 500;
        const settle = isFinalStatus(status)
          ? this.idempotency.complete(principal.teamId, key, status, buildProblem(error, String(request.id)).body)
          : this.idempotency.release(principal.teamId, key);
        return from(settle).pipe(mergeMap(() => throwError(() => error)));
      }),
    );
  }
}
