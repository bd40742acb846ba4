// Request schemas for people and invitations, shared by the server and the app's forms.
import { z } from 'zod';

export const roleSchema = z.enum(['admin', 'lead', 'technician', 'user']);

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 128;

export const emailSchema = z
  .string()
  .trim()
  .min(1, 'Enter an e-mail address.')
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email('Enter a valid e-mail address, like name@office.example.'));

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(PASSWORD_MAX, `Passwords have at most ${PASSWORD_MAX} characters.`),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const inviteSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, 'Enter the person’s name.').max(120),
  role: roleSchema,
  stationId: z.number().int().positive().nullish(),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const setRoleSchema = z.object({ role: roleSchema });

export const acceptInviteSchema = z
  .object({
    token: z.string().min(20).max(200),
    password: z
      .string()
      .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
      .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
export type AcceptInviteInput = z.infer<typeof acceptInviteSchema>;

export const pageQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
