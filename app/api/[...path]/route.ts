import { route } from '@/server/http/route';
import { AppError } from '@/server/errors';

// Any /api address no route handler serves: the API's JSON error shape, not the HTML not-found page.
async function noSuchRoute(): Promise<never> {
  throw new AppError('not_found', 'There is no API route at this address');
}

export const GET = route({ access: 'public' }, noSuchRoute);
export const POST = route({ access: 'public' }, noSuchRoute);
export const PUT = route({ access: 'public' }, noSuchRoute);
export const PATCH = route({ access: 'public' }, noSuchRoute);
export const DELETE = route({ access: 'public' }, noSuchRoute);
