'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { Button } from '@/components/ui/Button';

export function SignOutButton() {
  const [pending, setPending] = useState(false);

  return (
    <Button
      size="sm"
      disabled={pending}
      onClick={() => {
        setPending(true);
        void signOut({ callbackUrl: '/' });
      }}
    >
      {pending ? 'Signing out…' : 'Sign out'}
    </Button>
  );
}
