/** The DomainError a model entry point throws for bad input (anything else thrown is rethrown). */
import { DomainError } from '../../shared-model/api/result';

export function domainErrorOf(fn: () => unknown): DomainError {
  try {
    fn();
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a DomainError');
}
