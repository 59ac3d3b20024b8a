import { createHash } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';
import { env } from '../config/env';
import { badRequest } from '../errors';

const estimator = new ZxcvbnFactory({
  dictionary: { ...common.dictionary, ...english.dictionary },
  graphs: common.adjacencyGraphs,
  translations: english.translations,
});

/**
 * Refuses common and easily guessed passwords (score below 3 of 4), with the estimator's reason.
 * Length limits come from the shared schema; there are no composition rules.
 */
export function assertStrongPassword(password: string, context: string[] = [], field = 'password'): void {
  const result = estimator.check(password, context);
  if (result.score < 3) {
    // The estimator's own sentences may or may not end in a full stop.
    const sentence = (text: string) => (/[.!?]$/.test(text) ? text : `${text}.`);
    const reason = sentence(result.feedback.warning || 'This password is easy to guess');
    const hint = sentence(result.feedback.suggestions[0] ?? 'Try a longer phrase of unrelated words');
    throw badRequest('Choose a stronger password', { [field]: `${reason} ${hint}` });
  }
}

// bcrypt reads only the first 72 bytes; a SHA-256 digest first lets every character of a long passphrase count.
const digest = (password: string) => createHash('sha256').update(password, 'utf8').digest('base64');
export const hashPassword = (password: string) => bcrypt.hash(digest(password), env.BCRYPT_COST);
export const checkPassword = (password: string, hash: string) => bcrypt.compare(digest(password), hash);

let standIn: Promise<string> | undefined;
/** A hash of nothing in particular, compared against when an account is unknown. */
export const standInHash = () => (standIn ??= hashPassword('kettlewright stand-in'));
