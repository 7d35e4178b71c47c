import 'server-only';
import type { Container } from '@/models';
import type { ContainerDto } from '@/lib/contracts/containers';

export function toContainerDto(c: Container): ContainerDto {
  return { id: c.id, name: c.name, kind: c.kind, unit: 'g', tare: Number(c.tareG), version: c.version };
}
