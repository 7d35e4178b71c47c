import { z } from 'zod';
import { ROLES } from '@/lib/roles';
import { emailSchema, requiredText, versionSchema } from './common';

export const roleSchema = z.enum(ROLES, { error: `Role must be one of ${ROLES.join(', ')}` });

export const inviteUserSchema = z.object({
  name: requiredText('Name').trim().min(1, { error: 'Name is required' }).max(120, { error: 'At most 120 characters' }),
  email: emailSchema,
  role: roleSchema,
});
export type InviteUserInput = z.infer<typeof inviteUserSchema>;

export const updateUserSchema = z
  .object({ role: roleSchema.optional(), active: z.boolean({ error: 'active must be true or false' }).optional(), version: versionSchema })
  .refine((v) => v.role !== undefined || v.active !== undefined, { error: 'Change the role or the active flag', path: ['role'] });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export interface UserDto {
  id: number;
  email: string;
  name: string;
  role: (typeof ROLES)[number];
  active: boolean;
  status: 'active' | 'invited' | 'inactive';
  version: number;
  createdAt: string;
}
