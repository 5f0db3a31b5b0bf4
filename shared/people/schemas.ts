// Bodies of the people-and-projects calls, shared by the administrator's forms and the server.
import { z } from 'zod';
import { roles } from '../roles';
import { deskRoles, type DeskRole } from '../workflow/desks';
import { checkNewPassword, newPasswordShape, passwordSchema } from './password';

export const emailSchema = z.string().trim().toLowerCase().pipe(z.email('Enter a whole e-mail address, like name@agency.gov.'));
const personName = z.string().trim().min(1, 'Enter the person’s name.').max(120, 'Keep the name under 120 characters.');
// Empty means "none": the form sends what was typed and the server stores null.
const organization = z.string().trim().max(120, 'Keep the organization under 120 characters.');
const roleSchema = z.enum(roles, 'Choose one of the roles.');

export const inviteSchema = z.strictObject({
  email: emailSchema,
  name: personName,
  role: roleSchema,
  organization,
  projectIds: z.array(z.uuid('Choose projects from the list.')).max(100, 'Choose at most 100 projects.'),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const personUpdateSchema = z
  .strictObject({ role: roleSchema.optional(), organization: organization.optional() })
  .refine((v) => v.role !== undefined || v.organization !== undefined, { message: 'Send a role or an organization to change.' });
export type PersonUpdate = z.infer<typeof personUpdateSchema>;

export const memberAddSchema = z.strictObject({ userId: z.string().trim().min(1, 'Choose a person.') });

const dueDays = z
  .number('Enter a whole number of days.')
  .int('Enter a whole number of days.')
  .min(1, 'At least 1 day.')
  .max(90, 'At most 90 days.');
export const deskDueDaysSchema = z.strictObject(Object.fromEntries(deskRoles.map((desk) => [desk, dueDays])) as Record<DeskRole, typeof dueDays>);
export const projectSettingsSchema = z.strictObject({ deskDueDays: deskDueDaysSchema });
export type ProjectSettings = z.infer<typeof projectSettingsSchema>;

const token = z.string().trim().min(16, 'This link is incomplete; open it again from the e-mail.').max(200, 'This link is not one of ours.');
export const invitationTokenSchema = z.strictObject({ token });
export const acceptInvitationSchema = z.strictObject({ token, name: personName, password: passwordSchema });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

// The invited person's form: their name as they want it shown, and the password typed twice.
export function acceptInvitationFormSchema(email: string) {
  return z.strictObject({ name: personName, ...newPasswordShape }).superRefine(checkNewPassword(email));
}
export type AcceptInvitationValues = { name: string; password: string; confirm: string };

export const forgotPasswordSchema = z.strictObject({ email: emailSchema });
export type ForgotPasswordValues = z.infer<typeof forgotPasswordSchema>;
