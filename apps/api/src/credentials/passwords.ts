import argon2 from 'argon2';
import type { AuthConfig } from '../config/config';

/** argon2id hashes with the configured cost (cheap under NODE_ENV=test, see config.ts). */
export class Passwords {
  private dummy: Promise<string> | undefined;
  constructor(private readonly cost: AuthConfig['argon2']) {}

  hash(password: string): Promise<string> {
    return argon2.hash(password, { type: argon2.argon2id, ...this.cost });
  }

  async verify(hash: string, password: string): Promise<boolean> {
    try {
      return await argon2.verify(hash, password);
    } catch {
      // A malformed stored hash never signs anyone in.
      return false;
    }
  }

  /**
   * Spends the time of one verification when there is no account, so a
   * sign-in does not tell by its speed whether an address is registered.
   */
  async verifyNothing(password: string): Promise<false> {
    this.dummy ??= this.hash('hoopline-timing-equaliser');
    await this.verify(await this.dummy, password);
    return false;
  }
}
