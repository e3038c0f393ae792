import { QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ToastProvider } from '../components/ui/toast.tsx';
import { createQueryClient } from '../lib/query-client.ts';
import { meKey } from '../lib/queries/query-keys.ts';

/** Server state and toasts for the whole app. A lapsed session makes `me` refetch, which sends the person to sign-in. */
export function Providers({ children }: { children: ReactNode }) {
  const [queryClient] = useState(() => {
    const client = createQueryClient({ onUnauthenticated: () => void client.invalidateQueries({ queryKey: meKey }) });
    return client;
  });
  return (
    <QueryClientProvider client={queryClient}>
      <ToastProvider>{children}</ToastProvider>
    </QueryClientProvider>
  );
}
