import type { WorkspaceMembership } from '@/components/workspace/use-workspaces';

type WorkspaceOptionProps = {
  workspace: WorkspaceMembership;
  switching: boolean;
  disabled: boolean;
  onChoose: () => void;
};

export function WorkspaceOption({ workspace, switching, disabled, onChoose }: WorkspaceOptionProps) {
  return (
    <button
      type="button"
      onClick={onChoose}
      disabled={disabled}
      aria-current={workspace.active ? 'true' : undefined}
      className={[
        'flex w-full items-center gap-2 rounded-md px-2 py-1.5 text-left text-sm disabled:cursor-wait',
        workspace.active ? 'bg-accent-soft text-accent-strong' : 'text-ink hover:bg-paper-sunk',
      ].join(' ')}
      data-testid={`workspace-option-${workspace.name}`}
    >
      <svg
        viewBox="0 0 12 12"
        aria-hidden="true"
        focusable="false"
        className={`size-3 shrink-0 ${workspace.active ? '' : 'invisible'}`}
        fill="none"
        stroke="currentColor"
        strokeWidth="1.75"
        strokeLinecap="round"
        strokeLinejoin="round"
      >
        <path d="m2.5 6.5 2.5 2.5 4.5-6" />
      </svg>
      <span className="min-w-0 flex-1 truncate font-medium">{workspace.name}</span>
      {workspace.active ? <span className="sr-only">(current)</span> : null}
      <span className="tag">{switching ? 'switching…' : workspace.role}</span>
    </button>
  );
}
