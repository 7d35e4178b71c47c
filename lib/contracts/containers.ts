import { z } from 'zod';
import { CONTAINER_KINDS, type ContainerKind } from '@/lib/domain/stock';
import { requiredText, versionSchema } from './common';
import { nonNegativeNumber, unitSchema } from './weights';

const kindSchema = z.enum(CONTAINER_KINDS as unknown as [ContainerKind, ...ContainerKind[]], { error: `Kind must be one of ${CONTAINER_KINDS.join(', ')}` });

export const createContainerSchema = z.object({
  name: requiredText('Name').trim().min(1, { error: 'Name is required' }).max(80),
  kind: kindSchema,
  unit: unitSchema.default('g'),
  tare: nonNegativeNumber('Tare'),
});
export type CreateContainerInput = z.infer<typeof createContainerSchema>;

export const updateContainerSchema = createContainerSchema.partial().extend({ unit: unitSchema.default('g'), version: versionSchema });
export type UpdateContainerInput = z.infer<typeof updateContainerSchema>;

export interface ContainerDto {
  id: number;
  name: string;
  kind: ContainerKind;
  unit: 'g';
  tare: number;
  version: number;
}
