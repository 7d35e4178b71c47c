import 'server-only';
import { notFound } from 'next/navigation';
import { AppError } from '../errors';

// For pages: a record that does not exist shows the not-found page instead of the error boundary.
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (error) {
    if (error instanceof AppError && error.code === 'not_found') notFound();
    throw error;
  }
}
