'use client';

import { MutationCache, QueryCache, QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { SessionProvider } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type ReactNode } from 'react';
import { ApiError } from '@/components/api/api-error';

const MAX_RETRIES = 2;

function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.isClientError) return false;
  return failureCount < MAX_RETRIES;
}

type AppRouter = ReturnType<typeof useRouter>;

function createQueryClient(router: AppRouter): QueryClient {
  // An expired session surfaces as a 401 from any request; send the user to sign in and back.
  function redirectWhenSignedOut(error: unknown): void {
    if (!(error instanceof ApiError) || error.status !== 401) return;
    const here = `${window.location.pathname}${window.location.search}`;
    router.replace(`/sign-in?callbackUrl=${encodeURIComponent(here)}`);
  }

  return new QueryClient({
    queryCache: new QueryCache({ onError: redirectWhenSignedOut }),
    mutationCache: new MutationCache({ onError: redirectWhenSignedOut }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000 },
    },
  });
}

export function AppProviders({ children }: { children: ReactNode }) {
  const router = useRouter();
  // One client per browser tab; created lazily so a re-render never discards the cache.
  const [queryClient] = useState(() => createQueryClient(router));

  return (
    <SessionProvider>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </SessionProvider>
  );
}
