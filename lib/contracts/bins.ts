import { z } from 'zod';
import { BIN_CODE_HINT, formatBinCode, parseBinCode } from '@/lib/bin-code';
import { ABC_CLASSES, type AbcClass } from '@/lib/domain/stock';
import { pagingSchema, recordIdSchema, requiredText } from './common';
import { wholeCount } from './weights';

export const binCodeSchema = requiredText('Bin code').transform((text, ctx) => {
  const location = parseBinCode(text);
  if (!location) {
    ctx.addIssue({ code: 'custom', message: `Bin codes look like ${BIN_CODE_HINT}` });
    return z.NEVER;
  }
  return formatBinCode(location);
});

export const createBinSchema = z.object({
  code: binCodeSchema,
  partId: wholeCount('Part'),
  containerId: wholeCount('Container').nullish(),
  bookQuantity: wholeCount('Book quantity', 0),
  abcClass: z.enum(ABC_CLASSES as unknown as [AbcClass, ...AbcClass[]], { error: 'ABC class must be A, B or C' }).default('C'),
});
export type CreateBinInput = z.infer<typeof createBinSchema>;

export const listBinsSchema = pagingSchema.extend({
  // One bin by its code, as a scan or the bench's lookup sends it.
  code: z.string().trim().max(20).optional(),
  partId: recordIdSchema.optional(),
  // The start of a bin code or of a part number.
  q: z.string().trim().max(40).optional(),
});
export type ListBinsQuery = z.infer<typeof listBinsSchema>;

export interface BinDto {
  id: number;
  code: string;
  partId: number;
  partNumber: string;
  containerId: number | null;
  bookQuantity: number;
  abcClass: AbcClass;
  lastCountedAt: string | null;
  version: number;
}

export interface PendingVariance {
  id: number;
  binCode: string;
  partNumber: string;
  bookQuantity: number;
  counted: number;
  variance: number;
  percent: number | null;
  countedBy: string;
  countedById: number;
  countedAt: string;
}

export interface LastVariance {
  variance: number;
  status: string;
  countedAt: string;
}
