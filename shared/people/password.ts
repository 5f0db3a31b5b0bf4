// What a new password must be, for an invited person choosing one and for a reset. Checked by the
// form as it is typed and again by the server, with the same words.
import { z } from 'zod';

export const minPasswordLength = 10;
export const maxPasswordLength = 128;

export const passwordSchema = z
  .string()
  .min(minPasswordLength, `Use at least ${minPasswordLength} characters.`)
  .max(maxPasswordLength, `Use at most ${maxPasswordLength} characters.`);

// A password built on the address's name part is the first thing anyone guessing would try.
// Very short name parts (e.g. "al") would refuse too much, so they are not held against it.
export function passwordProblem(password: string, email: string): string | null {
  const parsed = passwordSchema.safeParse(password);
  if (!parsed.success) return parsed.error.issues[0]?.message ?? 'Choose another password.';
  const localPart = email.split('@')[0]?.toLowerCase() ?? '';
  if (localPart.length >= 3 && password.toLowerCase().includes(localPart)) {
    return 'The password must not contain the name part of your e-mail address.';
  }
  return null;
}

// The form's version: typed twice, so a slip of the finger is caught before it locks someone out.
export const newPasswordShape = { password: z.string(), confirm: z.string() };
export type NewPasswordValues = { password: string; confirm: string };

// Without the address (a reset link does not say whose it is) only the length can be checked here;
// the server checks the rest.
export function checkNewPassword(email: string | null) {
  return (value: NewPasswordValues, ctx: z.RefinementCtx) => {
    const problem = email ? passwordProblem(value.password, email) : passwordSchema.safeParse(value.password).error?.issues[0]?.message;
    if (problem) ctx.addIssue({ code: 'custom', path: ['password'], message: problem });
    if (value.confirm !== value.password) ctx.addIssue({ code: 'custom', path: ['confirm'], message: 'The two passwords differ.' });
  };
}

export function newPasswordFormSchema(email: string | null) {
  return z.strictObject(newPasswordShape).superRefine(checkNewPassword(email));
}
