import { z } from 'zod';

// "required" when missing, "must be text" when present with another type.
export function requiredText(label: string) {
  return z.string({ error: (iss) => (iss.input === undefined ? `${label} is required` : `${label} must be text`) });
}

export const emailSchema = requiredText('E-mail')
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address' }).max(254, { error: 'At most 254 characters' }));

export const idParamSchema = z.object({
  id: z.coerce.number({ error: 'Not a record id' }).int({ error: 'Not a record id' }).positive({ error: 'Not a record id' }),
});

export const versionSchema = z.number({ error: 'version is required (the one you loaded)' }).int().min(0);

export const pagingSchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(100),
});
