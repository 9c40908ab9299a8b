import { InputError } from '@shared/errors';

/** The InputError `fn` throws; any other error is rethrown, and throwing nothing fails. */
export function errorOf(fn: () => unknown): InputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}
