import { ButtonLink } from '@/components/ui/ButtonLink';

/** Shown in place of a workspace page when the account is not a member of any workspace. */
export function NoWorkspacePrompt() {
  return (
    <div
      data-testid="no-workspace"
      className="rounded-lg border border-dashed border-rule bg-paper-raised px-6 py-12 text-center"
    >
      <h1 className="text-xl">You are not in a workspace yet</h1>
      <p className="mx-auto mt-2 max-w-prose text-sm text-ink-soft">
        Circuits, members and reviews live in a workspace. Create one for your team, or ask a workspace
        owner to invite you and follow the link in their e-mail.
      </p>
      <ButtonLink href="/workspaces/new" variant="primary" className="mt-6">
        Create a workspace
      </ButtonLink>
    </div>
  );
}
