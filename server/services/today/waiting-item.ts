import type { Role } from '@/lib/roles';

export interface WaitingItem {
  key: string;
  title: string;
  count: number;
  detail: string;
  href: string;
}

// Each source answers for the roles it concerns (null otherwise); the Today page lists the non-empty ones.
export type WaitingSource = (user: { id: number; role: Role }) => Promise<WaitingItem | WaitingItem[] | null>;
