import { forbidden } from '../http/errors';
import type { Decision } from './policy';

/**
 * The one way a service acts on a decision of the policy: a refusal becomes
 * the 403 AppError with the policy's code and reason; an allowance passes.
 * (What the actor may not even see is a 404, decided by the service before.)
 */
export function enforce(decision: Decision): void {
  if (!decision.allowed) throw forbidden(decision.code, decision.reason);
}
