import { describe, expect, it } from 'vitest';
import { AppError } from '../http/errors';
import { enforce } from './enforce';
import { canManagePeople, canSignOff } from './policy';

describe('enforce', () => {
  it('lets an allowance pass', () => {
    expect(() => enforce(canManagePeople({ id: 'a', isAdmin: true }))).not.toThrow();
  });

  it("turns a refusal into a 403 with the policy's code and reason", () => {
    const refusal = canSignOff(
      { actor: { id: 'me', isAdmin: false }, role: 'checker' },
      { authorId: 'me', status: 'submitted' },
    );
    expect(refusal.allowed).toBe(false);
    let thrown: unknown;
    try {
      enforce(refusal);
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(AppError);
    expect(thrown).toMatchObject({
      status: 403,
      code: 'own_revision',
      message: 'nobody countersigns or returns a revision they authored',
    });
  });
});
