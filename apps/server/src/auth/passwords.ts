import { hash, verify } from '@node-rs/argon2';
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as en from '@zxcvbn-ts/language-en';

/** argon2id with the OWASP Password Storage Cheat Sheet's first option: m = 19 MiB, t = 2, p = 1. */
// `Algorithm` is an ambient const enum (unusable with isolatedModules); 2 is its Argon2id.
export const ARGON2_OPTIONS = { algorithm: 2, memoryCost: 19 * 1024, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => hash(password, ARGON2_OPTIONS);

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A hash of nothing anyone knows, verified when an e-mail is unknown so both answers take as long. */
let dummyHash: Promise<string> | undefined;
export const dummyVerify = async (password: string) => {
  dummyHash ??= hashPassword('barwright-timing-equaliser-' + Math.random());
  await verifyPassword(await dummyHash, password);
};

// Built on the first check, not at start: ranking the dictionaries takes a noticeable part of a start.
let estimator: ZxcvbnFactory | undefined;
const strengthEstimator = () =>
  (estimator ??= new ZxcvbnFactory({
    dictionary: { ...common.dictionary, ...en.dictionary },
    graphs: common.adjacencyGraphs,
    translations: en.translations,
  }));

/** zxcvbn score at or above which a password is accepted (0–4; 3 = "safely unguessable" for online attacks). */
export const MIN_PASSWORD_SCORE = 3;

/** Refuses common and easily guessed passwords (the zxcvbn estimator with its common-password lists). */
export function passwordWeakness(password: string, userInputs: string[]): string | undefined {
  const result = strengthEstimator().check(password, userInputs);
  if (result.score >= MIN_PASSWORD_SCORE) return undefined;
  const hint = result.feedback.warning || result.feedback.suggestions[0];
  return `is too easy to guess${hint ? ` (${hint.replace(/\.$/, '').toLowerCase()})` : ''}; use a longer phrase of unusual words`;
}
