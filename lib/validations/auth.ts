/** Sign-in, sign-up, password and invitation inputs: one schema each, shared by form and server. */
import { z } from 'zod';
import { roleNames } from '../permissions';

const email = z.string().trim().toLowerCase().email('Enter a valid e-mail address.').max(254);
const password = z.string().min(10, 'Use at least 10 characters.').max(128, 'Use at most 128 characters.');

export const signInSchema = z.object({ email, password: z.string().min(1, 'Enter your password.') });
export const signUpSchema = z.object({
  name: z.string().trim().min(2, 'Enter your name.').max(100),
  email,
  password,
});
export const forgotPasswordSchema = z.object({ email });
export const resetPasswordSchema = z
  .object({ password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
export const inviteSchema = z.object({
  email,
  role: z.enum(roleNames as [string, ...string[]], { error: 'Choose a role.' }),
});
export const changeRoleSchema = z.object({ memberId: z.string().min(1), role: inviteSchema.shape.role });
export const organisationCreateSchema = z.object({ name: z.string().trim().min(2, 'Enter the organisation’s name.').max(100) });

export type SignIn = z.infer<typeof signInSchema>;
export type SignUp = z.infer<typeof signUpSchema>;
export type Invite = z.infer<typeof inviteSchema>;
