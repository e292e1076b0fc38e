'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';

/**
 * After the server has made another workspace the active one (created, joined):
 * drop everything cached from the old one and open the new one's circuits.
 */
export function useEnterWorkspace() {
  const router = useRouter();
  const queryClient = useQueryClient();
  return () => {
    void queryClient.resetQueries();
    router.push('/circuits');
  };
}
