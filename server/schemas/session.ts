import { z } from 'zod';
import { emailSchema } from './common';

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Password is required' }).min(1, { error: 'Password is required' }).max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

// Rules for a new password (NIST SP 800-63B favours length over composition rules).
export const newPasswordSchema = z
  .string({ error: 'Password is required' })
  .min(10, { error: 'Use at least 10 characters' })
  .max(200, { error: 'At most 200 characters' });

export const acceptInvitationSchema = z.object({
  token: z.string({ error: 'The link is incomplete' }).regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The link is not valid' }),
  password: newPasswordSchema,
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
