import 'server-only';
import { Container } from '@/models';
import { getDb } from '../../db';
import type { ContainerDto } from '@/lib/contracts/containers';
import { toContainerDto } from './container-dto';

export async function listContainers(): Promise<ContainerDto[]> {
  getDb();
  return (await Container.findAll({ order: [['name', 'ASC']] })).map(toContainerDto);
}
