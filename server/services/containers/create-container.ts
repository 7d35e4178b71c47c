import 'server-only';
import { Container } from '@/models';
import { toGrams } from '@/lib/weighing/units';
import { getDb } from '../../db';
import type { ContainerDto, CreateContainerInput } from '@/lib/contracts/containers';
import { toContainerDto } from './container-dto';

export async function createContainer({ input }: { input: CreateContainerInput }): Promise<ContainerDto> {
  getDb();
  const row = await Container.create({ name: input.name, kind: input.kind, tareG: String(toGrams(input.tare, input.unit)) });
  return toContainerDto(row);
}
