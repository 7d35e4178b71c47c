import { ForbiddenNotice } from './_components/forbidden-notice';
import { Wordmark } from './_components/mark';

// Refused by the shell before any of it was sent (a full page load): the notice on its own, with 403.
export default function Forbidden() {
  return (
    <main className="min-h-screen grid place-items-center p-6">
      <div>
        <div className="flex justify-center mb-4">
          <Wordmark />
        </div>
        <ForbiddenNotice />
      </div>
    </main>
  );
}
