import { z } from 'zod';
import type { LineVerdict, OrderStatus } from '@/lib/domain/orders';
import { pagingSchema, recordIdSchema, versionSchema } from './common';
import { wholeCount } from './weights';

export const createOrderSchema = z.object({
  kitId: wholeCount('Kit'),
  quantity: wholeCount('Number of kits').max(100_000, { error: 'At most 100 000 kits per order' }),
  dueDate: z.iso.date({ error: 'Due date must be a date (YYYY-MM-DD)' }).nullish(),
});
export type CreateOrderInput = z.infer<typeof createOrderSchema>;

export const orderActionSchema = z.object({ version: versionSchema });
export const lineParamsSchema = z.object({ id: recordIdSchema, lineId: recordIdSchema });

export const completeOrderSchema = z.object({
  version: versionSchema,
  // A planner may complete with lines not in tolerance; the reason is kept on the order.
  overrideReason: z.string().trim().min(10, { error: 'Say in a sentence why the order is complete anyway' }).max(500).optional(),
});
export type CompleteOrderInput = z.infer<typeof completeOrderSchema>;

export const ORDER_LIST_FILTERS = ['draft', 'released', 'in_progress', 'complete', 'cancelled', 'open'] as const;
export const listOrdersSchema = pagingSchema.extend({
  status: z.enum(ORDER_LIST_FILTERS).optional(),
  // The start of an order number or of a kit code.
  q: z.string().trim().max(40).optional(),
});
export type ListOrdersQuery = z.infer<typeof listOrdersSchema>;

export interface OrderLineDto {
  id: number;
  partId: number;
  partNumber: string;
  description: string;
  quantityPerKit: number;
  required: number;
  toleranceBelow: number;
  toleranceAbove: number;
  counted: number;
  expandedUncertainty: number;
  /** ± whole pieces at 95 %; 0 when every capture was exact. */
  wholePieceRange: number;
  captures: number;
  verdict: LineVerdict;
}

export interface OrderDto {
  id: number;
  number: string;
  kitId: number;
  kitCode: string;
  kitRevision: string;
  kitDescription: string;
  quantity: number;
  dueDate: string | null;
  status: OrderStatus;
  releasedAt: string | null;
  completedAt: string | null;
  overrideReason: string | null;
  lines: OrderLineDto[];
  progress: { linesDone: number; lines: number };
  version: number;
}

/** An order as lists show it: its progress without its lines. */
export type OrderSummaryDto = Omit<OrderDto, 'lines'>;

export interface AvailabilityLine {
  partId: number;
  partNumber: string;
  required: number;
  onHand: number;
  reserved: number;
  available: number;
  shortage: number;
}

export interface QueueLine {
  orderLineId: number;
  orderId: number;
  orderNumber: string;
  kitCode: string;
  kitRevision: string;
  dueDate: string | null;
  partId: number;
  partNumber: string;
  description: string;
  required: number;
  counted: number;
  remaining: number;
  toleranceBelow: number;
  toleranceAbove: number;
  expandedUncertainty: number;
  wholePieceRange: number;
  verdict: string;
}
