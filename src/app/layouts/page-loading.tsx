import { Spinner } from '../../components/ui/spinner.tsx';

/** What shows while the first page's code arrives (pages load on demand, see router.tsx). */
export function PageLoading() {
  return (
    <main className="flex min-h-screen items-center justify-center">
      <Spinner label="Loading Ridewright" />
    </main>
  );
}
