import type { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { AppError } from '../lib/app-error';

/**
 * zxcvbn-ts estimates how many guesses a password takes from dictionaries of common passwords,
 * names and keyboard patterns shipped with the package (no network call). Score 3 means about
 * 10^8 to 10^10 guesses: with argon2 and the sign-in limits, well out of reach.
 */
export const minimumScore = 3;

// Its dictionaries hold about 6 MB of heap; passwords are set rarely, so they load on the first check.
let estimator: Promise<ZxcvbnFactory> | undefined;
function loadEstimator(): Promise<ZxcvbnFactory> {
  estimator ??= Promise.all([import('@zxcvbn-ts/core'), import('@zxcvbn-ts/language-common')]).then(
    ([core, common]) => new core.ZxcvbnFactory({ dictionary: common.dictionary, graphs: common.adjacencyGraphs }),
  );
  return estimator;
}

// zxcvbn-ts names what it found by key; the words are ours.
const reasons: Record<string, string> = {
  straightRow: 'A row of keys on the keyboard is easy to guess',
  keyPattern: 'A keyboard pattern is easy to guess',
  simpleRepeat: 'Repeated characters such as "aaa" are easy to guess',
  extendedRepeat: 'Repeated groups such as "abcabc" are easy to guess',
  sequences: 'Sequences such as "abc" or "6543" are easy to guess',
  recentYears: 'Recent years are easy to guess',
  dates: 'Dates are easy to guess',
  topTen: 'This is one of the ten most common passwords',
  topHundred: 'This is one of the hundred most common passwords',
  common: 'This is a commonly used password',
  similarToCommon: 'This is too close to a commonly used password',
  wordByItself: 'A single word is easy to guess',
  namesByThemselves: 'Names on their own are easy to guess',
  commonNames: 'Common names are easy to guess',
  userInputs: 'It should not be built from the person’s name or e-mail',
};

/** Why `password` is too easy to guess, or null when it is strong enough. `related` are words an attacker would try first. */
export async function passwordWeakness(password: string, related: string[] = []): Promise<string | null> {
  // Whole e-mails and names, and their parts ("kit", "arden"), which people build passwords from.
  const words = related.flatMap((text) => [text, ...text.toLowerCase().split(/[^\p{L}\p{N}]+/u).filter((w) => w.length >= 3)]);
  const result = (await loadEstimator()).check(password, [...words, 'boothwright']);
  if (result.score >= minimumScore) return null;
  const why = result.feedback.warning ? reasons[result.feedback.warning] : undefined;
  return `${why ?? 'This password is too easy to guess'}: use a few unrelated words or a longer phrase`;
}

/** Throws a field-level 400 when the password is too easy to guess. */
export async function assertStrongPassword(password: string, related: string[]): Promise<void> {
  const weakness = await passwordWeakness(password, related);
  if (weakness) throw new AppError('validation_failed', 'Choose a password that is harder to guess', { password: weakness });
}
