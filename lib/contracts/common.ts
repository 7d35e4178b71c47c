import { z } from 'zod';

// "required" when missing, "must be text" when present with another type.
export function requiredText(label: string) {
  return z.string({ error: (iss) => (iss.input === undefined ? `${label} is required` : `${label} must be text`) });
}

export const emailSchema = requiredText('E-mail')
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address' }).max(254, { error: 'At most 254 characters' }));

// A record id as it arrives in a path or query: plain decimal digits only. Number() alone would also
// take "0x1F", "1e3" or " 7 ", so two spellings could name one record; ids are INT columns.
export const recordIdSchema = z
  .string({ error: 'Not a record id' })
  .regex(/^[1-9][0-9]{0,9}$/, { error: 'Not a record id' })
  .transform(Number)
  .pipe(z.number().max(2_147_483_647, { error: 'Not a record id' }));

export const idParamSchema = z.object({ id: recordIdSchema });

export const versionSchema = z.number({ error: 'version is required (the one you loaded)' }).int().min(0);

// A page of a list; no list route answers more than 500 rows at once. The page is bounded too, so an
// offset never overflows what the database takes.
export const pagingSchema = z.object({
  page: z.coerce.number().int().min(1).max(1_000_000, { error: 'page is at most 1000000' }).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(100),
});
export type Paging = z.infer<typeof pagingSchema>;
export type { PageOf } from '@/lib/page-range';

// The LIKE pattern of text typed by a user: its wildcards match literally.
export const startsWithPattern = (text: string) => `${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

// Chosen by the client once per capture or create and reused on every retry of it.
export const idempotencyKeySchema = z
  .string({ error: 'The Idempotency-Key header is required' })
  .regex(/^[A-Za-z0-9_.:-]{8,100}$/, { error: 'Idempotency-Key must be 8–100 letters, digits or _ . : -' });
