import { z } from 'zod';
import { newPasswordSchema } from '../../../../shared/contracts/auth';

/** The shared password rule plus a second entry that must match the first. */
export const confirmedPasswordShape = {
  password: newPasswordSchema,
  passwordAgain: z.string(),
};

export function passwordsMatch(values: { password: string; passwordAgain: string }): boolean {
  return values.password === values.passwordAgain;
}

export const PASSWORD_MISMATCH = { message: 'The two passwords differ.', path: ['passwordAgain'] };

export const PASSWORD_HINT = 'At least 10 characters. A short sentence is easy to remember and hard to guess.';
