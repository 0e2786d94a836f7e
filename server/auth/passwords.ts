/**
 * Passwords: argon2id hashes (@node-rs/argon2, OWASP's minimum parameters: 19 MiB, 2 passes, 1 lane),
 * and a strength judgement with zxcvbn-ts against its common-password dictionary.
 */
import crypto from 'node:crypto';
import { hash, verify, type Algorithm, type Options } from '@node-rs/argon2';
import { ZxcvbnFactory, type TranslationKeys } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';

// `Algorithm` is a const enum in the package's types, which esbuild and babel cannot inline: 2 is Argon2id.
const ARGON2ID = 2 as Algorithm;
const HASH_OPTIONS: Options = { algorithm: ARGON2ID, memoryCost: 19_456, timeCost: 2, parallelism: 1 };

export const hashPassword = (password: string): Promise<string> => hash(password, HASH_OPTIONS);

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/**
 * The hash a failed look-up is checked against, so that "no such account" takes as long as "wrong
 * password": same parameters, a password nobody knows.
 */
let dummy: Promise<string> | null = null;
export function burnPasswordCheck(password: string): Promise<boolean> {
  dummy ??= hashPassword(crypto.randomBytes(32).toString('base64url'));
  return dummy.then((h) => verifyPassword(h, password));
}
/** Starts computing the dummy hash now, so that the first failed sign-in is not the slow one. */
export function prepareDummyHash(): void {
  dummy ??= hashPassword(crypto.randomBytes(32).toString('base64url'));
}

/** zxcvbn's feedback, in our own words. */
const translations: TranslationKeys = {
  warnings: {
    straightRow: 'A straight row of keys on the keyboard is easy to guess.',
    keyPattern: 'A short pattern of keys on the keyboard is easy to guess.',
    simpleRepeat: 'Repeated characters such as "aaa" are easy to guess.',
    extendedRepeat: 'Repeated groups of characters such as "abcabc" are easy to guess.',
    sequences: 'Sequences such as "abc" or "6543" are easy to guess.',
    recentYears: 'Recent years are easy to guess.',
    dates: 'Dates are easy to guess.',
    topTen: 'This is one of the ten most used passwords.',
    topHundred: 'This is one of the hundred most used passwords.',
    common: 'This is a commonly used password.',
    similarToCommon: 'This is too close to a commonly used password.',
    wordByItself: 'A single word is easy to guess.',
    namesByThemselves: 'Names and surnames on their own are easy to guess.',
    commonNames: 'Common names and surnames are easy to guess.',
    userInputs: 'It should not contain your name or e-mail address.',
    pwned: 'This password has appeared in a data breach.',
  },
  suggestions: {
    l33t: "Swapping letters for look-alikes (such as 'a' for '@') does not help much.",
    reverseWords: 'Spelling a common word backwards does not help much.',
    allUppercase: 'Capitalising some letters, not all, helps a little.',
    capitalization: 'A capital first letter does not help much.',
    dates: 'Leave out dates and years that belong to you.',
    recentYears: 'Leave out recent years.',
    associatedYears: 'Leave out years that belong to you.',
    sequences: 'Leave out common character sequences.',
    repeated: 'Leave out repeated words and characters.',
    longerKeyboardPattern: 'Use longer keyboard patterns and change direction several times.',
    anotherWord: 'Add more words that are less common.',
    useWords: 'Use several words, but not well-known phrases.',
    noNeed: 'Symbols, digits and capitals are not required.',
    pwned: 'Use this password nowhere else and change it where you did.',
  },
  timeEstimation: {
    ltSecond: 'less than a second',
    second: '{base} second',
    seconds: '{base} seconds',
    minute: '{base} minute',
    minutes: '{base} minutes',
    hour: '{base} hour',
    hours: '{base} hours',
    day: '{base} day',
    days: '{base} days',
    month: '{base} month',
    months: '{base} months',
    year: '{base} year',
    years: '{base} years',
    centuries: 'centuries',
  },
};

let zxcvbn: ZxcvbnFactory | null = null;
const estimator = () => (zxcvbn ??= new ZxcvbnFactory({ dictionary: { ...dictionary }, graphs: adjacencyGraphs, translations }));

/** The lowest zxcvbn score (0–4) we accept: 3 is "safely unguessable: moderate protection from offline attacks". */
export const MIN_SCORE = 3;

/**
 * Null when the password is strong enough; otherwise a sentence saying why not and what to do.
 * Refused: a score below 3, or a password that is itself an entry of the common-password list.
 * `userInputs` (the e-mail address, the display name) count as easy to guess.
 */
export function passwordWeakness(password: string, userInputs: string[] = []): string | null {
  const inputs = userInputs.flatMap((s) => [s, ...s.split(/[@.\s_-]+/)]).filter((s) => s.length >= 3);
  const result = estimator().check(password, inputs);
  const common = result.sequence.some(
    (m) => m.pattern === 'dictionary' && String(m.dictionaryName).startsWith('passwords') && m.i === 0 && m.j === password.length - 1,
  );
  if (!common && result.score >= MIN_SCORE) return null;
  const why = result.feedback.warning || (common ? translations.warnings.common : 'This password would be too easy to guess.');
  const advice = result.feedback.suggestions.length ? result.feedback.suggestions : [translations.suggestions.useWords];
  return [...new Set([why, ...advice])].join(' ');
}
