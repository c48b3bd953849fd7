import { ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ProblemException } from '../common/problem-details/problem.exception';
import { ApiKeyScope } from './api-key-scopes';
import { ApiKeyUsageRecorder } from './api-key-usage-recorder.service';
import { ApiKeyGuard, REQUIRED_SCOPES } from './api-key.guard';
import { ApiPrincipal } from './api-principal';

/** The scope check, with authentication (the passport part) replaced by a fixed principal. */
describe('ApiKeyGuard scope check', () => {
  const principal: ApiPrincipal = { teamId: 't', keyId: 'k', scopes: ['fits:run', 'datasets:read'], teamPlan: 'growth' };

  function contextFor(required: ApiKeyScope[] | undefined) {
    const handler = () => undefined;
    if (required) Reflect.defineMetadata(REQUIRED_SCOPES, required, handler);
    const request = { user: principal, ip: '203.0.113.9' };
    return {
      getHandler: () => handler,
      getClass: () => class {},
      switchToHttp: () => ({ getRequest: () => request }),
    } as unknown as ExecutionContext;
  }

  function guard(noted: Array<[string, string]>) {
    const recorder = { note: (keyId: string, ip: string) => noted.push([keyId, ip]) } as unknown as ApiKeyUsageRecorder;
    const instance = new ApiKeyGuard(new Reflector(), recorder);
    jest.spyOn(Object.getPrototypeOf(ApiKeyGuard.prototype), 'canActivate').mockResolvedValue(true);
    return instance;
  }

  afterEach(() => jest.restoreAllMocks());

  it('lets a key with every required scope through and notes its use', async () => {
    const noted: Array<[string, string]> = [];
    await expect(guard(noted).canActivate(contextFor(['fits:run']))).resolves.toBe(true);
    expect(noted).toEqual([['k', '203.0.113.9']]);
  });

  it('refuses a key lacking a scope with 403 naming the missing scopes', async () => {
    const noted: Array<[string, string]> = [];
    const attempt = guard(noted).canActivate(contextFor(['fits:run', 'datasets:write', 'usage:read']));
    await expect(attempt).rejects.toBeInstanceOf(ProblemException);
    await attempt.catch((error: ProblemException) => {
      expect(error.problemType.slug).toBe('insufficient-scope');
      expect(error.extensions).toEqual({ missingScopes: ['datasets:write', 'usage:read'] });
    });
    expect(noted).toEqual([]);
  });

  it('needs no scope when the route names none', async () => {
    await expect(guard([]).canActivate(contextFor(undefined))).resolves.toBe(true);
  });

  it('turns "no key in either header" into an unauthenticated problem', () => {
    expect(() => guard([]).handleRequest(null, false)).toThrow(ProblemException);
  });
});
