import { Link } from 'react-router';
import { Wordmark } from '../brand.tsx';

/** Unknown address. `inShell` when drawn inside the signed-in frame (no second wordmark). */
export function NotFoundRoute({ inShell = false }: { inShell?: boolean }) {
  const body = (
    <div className="max-w-lg">
      <p className="figures text-sm text-ink-faint">404</p>
      <h1 className="mt-1 text-2xl font-semibold">Nothing at this address</h1>
      <p className="mt-2 text-ink-soft">
        The page may have moved, or the link was copied only in part. If it points into a workspace, you may not be a member of it.
      </p>
      <p className="mt-6">
        <Link to="/" className="font-medium text-accent underline decoration-accent/40 underline-offset-2 hover:decoration-accent">
          Go to your workspace
        </Link>
      </p>
    </div>
  );
  if (inShell) return <div className="px-5 py-10 lg:px-8">{body}</div>;
  return (
    <main className="mx-auto flex min-h-screen max-w-3xl flex-col px-6 py-8">
      <Link to="/" className="self-start rounded-sm">
        <Wordmark />
      </Link>
      <div className="flex flex-1 items-center">{body}</div>
    </main>
  );
}
