import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { HeaderAPIKeyStrategy } from 'passport-headerapikey';
import { ApiKeyAuthenticator } from './api-key-authenticator.service';
import { ApiPrincipal } from './api-principal';

export const BEARER_KEY_STRATEGY = 'leastline-bearer-key';
export const HEADER_KEY_STRATEGY = 'leastline-header-key';
export const API_KEY_HEADER = 'X-Leastline-Key';

/*
 * `passReqToCallback` stays false: passport-headerapikey would pass the request after `done`, and
 * @nestjs/passport treats the last argument as `done`. The guard records the caller's address instead.
 */

/** `Authorization: Bearer llsq1_…` */
@Injectable()
export class BearerKeyStrategy extends PassportStrategy(HeaderAPIKeyStrategy, BEARER_KEY_STRATEGY) {
  constructor(private readonly authenticator: ApiKeyAuthenticator) {
    super({ header: 'Authorization', prefix: 'Bearer ' }, false);
  }

  validate(apiKey: string): Promise<ApiPrincipal> {
    return this.authenticator.authenticate(apiKey);
  }
}

/** `X-Leastline-Key: llsq1_…` */
@Injectable()
export class HeaderKeyStrategy extends PassportStrategy(HeaderAPIKeyStrategy, HEADER_KEY_STRATEGY) {
  constructor(private readonly authenticator: ApiKeyAuthenticator) {
    super({ header: API_KEY_HEADER, prefix: '' }, false);
  }

  validate(apiKey: string): Promise<ApiPrincipal> {
    return this.authenticator.authenticate(apiKey);
  }
}
