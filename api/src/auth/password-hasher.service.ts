import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import bcrypt from 'bcryptjs';
import { securityConfig } from '../config/configuration';

/**
 * bcrypt (cost from LEASTLINE_PASSWORD_HASH_COST). Passwords are limited to 72 UTF-8 bytes by the DTOs
 * because bcrypt ignores anything beyond that.
 */
@Injectable()
export class PasswordHasher {
  private dummyHash: Promise<string> | undefined;

  constructor(@Inject(securityConfig.KEY) private readonly security: ConfigType<typeof securityConfig>) {}

  hash(password: string): Promise<string> {
    return bcrypt.hash(password, this.security.passwordHashCost);
  }

  /**
   * Compares against the stored hash, or, when there is no account, against a throw-away hash of the same
   * cost, so an unknown e-mail takes as long to refuse as a wrong password.
   */
  async verify(password: string, storedHash: string | undefined): Promise<boolean> {
    if (storedHash) return bcrypt.compare(password, storedHash);
    this.dummyHash ??= bcrypt.hash('no account has this password', this.security.passwordHashCost);
    await bcrypt.compare(password, await this.dummyHash);
    return false;
  }
}
