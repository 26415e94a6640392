import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';

export const PASSWORD_IS_COMMON =
  'This password is among the most common ones, so it is guessed first. Choose another: a few unrelated words work well.';

/**
 * zxcvbn-ts over the common-password list of @zxcvbn-ts/language-common (about 49,000 passwords from
 * breach corpora, most common first) and its keyboard layouts, so case changes, l33t spellings, reversals,
 * repeats, sequences and keyboard walks of those passwords are found too. Built once (about 80 ms) when the
 * server loads. Server only: the dictionary must never reach the web bundle.
 * At most 4 l33t substitutions and the first 64 characters are examined, which keeps the slowest check near
 * 20 ms (the full defaults took over 400 ms on a crafted l33t password, holding the event loop); the list's
 * longest entry has 20 characters.
 */
const checker = new ZxcvbnFactory({
  dictionary: { 'passwords-common': dictionary['passwords-common'] },
  graphs: adjacencyGraphs,
  l33tMaxSubstitutions: 4,
  maxLength: 64,
});

/** zxcvbn's score 1 and below: fewer than 10^6 guesses ("too guessable", "very guessable"). */
const LOWEST_ALLOWED_SCORE = 2;

/**
 * True when the password is one of the most common passwords or a simple variation of one (zxcvbn score
 * under 2). `personal` holds words of the person (e-mail, name) that count as guessable too.
 */
export function isCommonPassword(password: string, personal: string[] = []): boolean {
  return checker.check(password, personal).score < LOWEST_ALLOWED_SCORE;
}
