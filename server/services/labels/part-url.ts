import 'server-only';
import { getEnv } from '../../env';

// The part page a label's QR code opens.
export function partUrl(partId: number): string {
  return `${getEnv().APP_URL.replace(/\/$/, '')}/parts/${partId}`;
}
