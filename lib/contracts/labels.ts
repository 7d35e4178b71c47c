import { z } from 'zod';
import { KIT_LABEL_STOCKS, LABEL_STOCK_IDS, LABEL_TEMPLATES, type LabelTemplate, type PrintJobStatus } from '@/lib/domain/labels';

export const MAX_LABELS_PER_PDF = 1000;
export const MAX_LABELS_PER_PRINT = 5000;

export const labelStockSchema = z.enum(LABEL_STOCK_IDS, { error: `Stock must be one of ${LABEL_STOCK_IDS.join(', ')}` });
const templateSchema = z.enum(LABEL_TEMPLATES, { error: 'Template must be bin, part or kit' });
const idSchema = z
  .number({ error: 'Each id must be a record id' })
  .int({ error: 'Each id must be a record id' })
  .positive({ error: 'Each id must be a record id' });

const idsSchema = (max: number) =>
  z
    .array(idSchema, { error: 'ids must be a list of record ids' })
    .min(1, { error: 'Give at least one id' })
    .max(max, { error: `At most ${max} labels at a time` });

// Kit labels need the room of a 4 in wide stock (see labels/templates/kit-label.ts).
function kitNeedsWideStock(value: { template: LabelTemplate; stock: string }, ctx: z.RefinementCtx): void {
  if (value.template === 'kit' && !(KIT_LABEL_STOCKS as readonly string[]).includes(value.stock)) {
    ctx.addIssue({ code: 'custom', path: ['stock'], message: `Kit labels print on ${KIT_LABEL_STOCKS.join(' or ')}` });
  }
}

// ids are bin ids, part ids, or — for kit labels — build order ids.
export const labelRequestSchema = z
  .object({ template: templateSchema, stock: labelStockSchema, ids: idsSchema(MAX_LABELS_PER_PDF) })
  .superRefine(kitNeedsWideStock);
export type LabelRequest = z.infer<typeof labelRequestSchema>;

export const binLabelQuerySchema = z.object({ stock: labelStockSchema.default('4x2in') });

export const printJobRequestSchema = z
  .object({
    template: templateSchema,
    stock: labelStockSchema,
    ids: idsSchema(MAX_LABELS_PER_PRINT),
    // A queue on the configured print server (the last part of PRINTER_URL), never an address of the caller's choosing.
    printer: z
      .string({ error: 'Printer must be a queue name' })
      .regex(/^[A-Za-z0-9._-]{1,40}$/, { error: 'Printer is a queue name: letters, digits, . _ - (at most 40)' })
      .optional(),
  })
  .superRefine(kitNeedsWideStock);
export type PrintJobRequest = z.infer<typeof printJobRequestSchema>;

export const listPrintJobsSchema = z.object({
  batch: z.uuid({ error: 'batch is a batch id from POST /api/v1/print-jobs' }).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});

export interface PrintJobDto {
  id: number;
  batchId: string;
  batchIndex: number;
  batchCount: number;
  template: string;
  stock: string;
  ids: number[];
  labels: number;
  printer: string;
  status: PrintJobStatus;
  pages: number | null;
  bytes: number | null;
  printerJobId: number | null;
  error: string | null;
  /** Something the printed labels lack (characters the fonts could not print); the job still went. */
  note: string | null;
  requestedBy: number | null;
  createdAt: string;
  sentAt: string | null;
}
