'use client';

import { useMutation } from '@tanstack/react-query';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useEnterWorkspace } from '@/components/workspace/use-enter-workspace';
import { acceptInvitation } from './invitation-api';

/** For a visitor already signed in with the invited address: one click joins. */
export function AcceptAsMemberButton({ token }: { token: string }) {
  const enterWorkspace = useEnterWorkspace();
  const accept = useMutation({
    mutationFn: () => acceptInvitation({ token }),
    onSuccess: enterWorkspace,
  });
  const busy = accept.isPending || accept.isSuccess;

  return (
    <div className="space-y-4">
      {accept.isError ? <FormAlert tone="error">{accept.error.message}</FormAlert> : null}
      <Button
        variant="primary"
        className="w-full"
        disabled={busy}
        onClick={() => accept.mutate()}
        data-testid="invite-accept"
      >
        {busy ? 'Joining…' : 'Accept and join'}
      </Button>
    </div>
  );
}
