import { z } from 'zod';
import { emailSchema, requiredText } from './common';

export const signInSchema = z.object({
  email: emailSchema,
  password: requiredText('Password').min(1, { error: 'Password is required' }).max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

// Rules for a new password (NIST SP 800-63B favours length over composition rules).
export const newPasswordSchema = requiredText('Password').min(10, { error: 'Use at least 10 characters' }).max(200, { error: 'At most 200 characters' });

export const acceptInvitationSchema = z.object({
  token: requiredText('The link').regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The link is not valid' }),
  password: newPasswordSchema,
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
