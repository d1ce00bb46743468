import { z } from 'zod';
import { ROLES } from '@/lib/enums';

export const emailField = z
  .string({ error: 'email is required' })
  .trim()
  .max(254, 'email must be at most 254 characters')
  .toLowerCase()
  .pipe(z.email({ error: 'email must be an e-mail address' }));

export const passwordField = z
  .string({ error: 'password is required' })
  .min(10, 'password must be at least 10 characters')
  .max(200, 'password must be at most 200 characters');

export const nameField = z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(100, 'name must be at most 100 characters');

export const signUpSchema = z.object({
  email: emailField,
  password: passwordField,
  name: nameField,
  teamName: z.string({ error: 'teamName is required' }).trim().min(1, 'teamName is required').max(100, 'teamName must be at most 100 characters'),
});

export const signInSchema = z.object({
  email: z.string({ error: 'email is required' }).trim().min(1, 'email is required').max(254, 'email must be at most 254 characters').toLowerCase(),
  password: z.string({ error: 'password is required' }).min(1, 'password is required').max(200, 'password must be at most 200 characters'),
});

export const roleField = z.enum(ROLES, { error: `role must be one of ${ROLES.join(', ')}` });

export const invitationSchema = z.object({ email: emailField, role: roleField });

export const acceptInvitationSchema = z.object({ name: nameField, password: passwordField });

export const changeRoleSchema = z.object({ userId: z.string().min(1).max(64), role: roleField });

export type SignUpInput = z.infer<typeof signUpSchema>;
export type SignInInput = z.infer<typeof signInSchema>;
