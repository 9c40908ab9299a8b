import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import { ValidationError } from '../../errors';

// Very common passwords are refused at sign-up, judged by zxcvbn-ts (its dictionaries of leaked passwords and
// keyboard patterns): a score under 2 is "too guessable" or "very guessable" in its own terms, under 10^6 guesses.
const zxcvbn = new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs });

export const MIN_PASSWORD_SCORE = 2;

/** Throws 400 on `password` when it is among the very common ones (or built from the person's own e-mail or name). */
export function refuseCommonPassword(password: string, userInputs: string[]): void {
  // zxcvbn's work grows with length; past 72 bytes bcrypt would refuse it anyway (the schema does).
  const result = zxcvbn.check(password.slice(0, 100), userInputs);
  if (result.score < MIN_PASSWORD_SCORE) {
    const hint = result.feedback.warning ? `: ${result.feedback.warning}` : '';
    throw new ValidationError({ password: `Too common or easy to guess${hint}; add a few unrelated words` }, 'Choose a less common password');
  }
}
