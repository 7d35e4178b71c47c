import { ForbiddenNotice } from '../_components/forbidden-notice';

// Refused by the page itself, as when moving within the app: the notice inside the shell.
export default function ShellForbidden() {
  return <ForbiddenNotice />;
}
