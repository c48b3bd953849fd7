import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { CsrfService } from './csrf.service';

/** CSRF check for console routes that do not need a session (sign-in, password reset, invitation acceptance). */
@Injectable()
export class CsrfGuard implements CanActivate {
  constructor(private readonly csrf: CsrfService) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const http = context.switchToHttp();
    await this.csrf.verify(http.getRequest<FastifyRequest>(), http.getResponse<FastifyReply>());
    return true;
  }
}
