import { compactSelectClassName } from '@/components/forms/control-styles';
import { Button } from '@/components/ui/Button';
import { WORKSPACE_ROLES, type WorkspaceRole } from '@/components/workspace/roles';
import type { Member } from './members-api';

const joinedFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium' });

type MemberRowProps = {
  member: Member;
  isYou: boolean;
  canManage: boolean;
  /** The role being saved for this member, shown at once so the list does not snap back while it saves. */
  pendingRole: WorkspaceRole | null;
  onRoleChange: (role: WorkspaceRole) => void;
  confirmingRemoval: boolean;
  removing: boolean;
  onRemoveAsk: () => void;
  onRemoveCancel: () => void;
  onRemoveConfirm: () => void;
};

export function MemberRow({
  member,
  isYou,
  canManage,
  pendingRole,
  onRoleChange,
  confirmingRemoval,
  removing,
  onRemoveAsk,
  onRemoveCancel,
  onRemoveConfirm,
}: MemberRowProps) {
  const joined = new Date(member.joinedAt);
  const joinedText = Number.isNaN(joined.getTime()) ? '—' : joinedFormat.format(joined);

  return (
    <tr data-testid="member-row" className="border-t border-rule align-middle">
      <th scope="row" className="px-2.5 py-3 sm:px-4 text-left font-normal">
        <span className="block font-medium text-ink">
          {member.name}
          {isYou ? <span className="ml-1 font-normal text-ink-soft">(you)</span> : null}
        </span>
        {/* The e-mail column is hidden on narrow screens, so the address moves under the name. */}
        <span className="mt-0.5 block break-all text-xs text-ink-soft sm:hidden">{member.email}</span>
      </th>
      <td className="hidden px-2.5 py-3 sm:px-4 text-ink-soft sm:table-cell">{member.email}</td>
      <td className="px-2.5 py-3 sm:px-4">
        {canManage ? (
          <select
            aria-label={`Role of ${member.name}`}
            value={pendingRole ?? member.role}
            disabled={pendingRole !== null}
            onChange={(event) => onRoleChange(event.target.value as WorkspaceRole)}
            className={compactSelectClassName}
            data-testid={`member-role-${member.email}`}
          >
            {WORKSPACE_ROLES.map((role) => (
              <option key={role} value={role}>
                {role}
              </option>
            ))}
          </select>
        ) : (
          <span className="tag">{member.role}</span>
        )}
      </td>
      <td className="hidden px-2.5 py-3 sm:px-4 text-ink-soft md:table-cell">
        <time dateTime={member.joinedAt}>{joinedText}</time>
      </td>
      {canManage ? (
        <td className="px-2.5 py-3 sm:px-4 text-right">
          {confirmingRemoval ? (
            <span className="inline-flex flex-wrap items-center justify-end gap-2">
              <span className="text-xs text-ink-soft">Remove {isYou ? 'yourself' : member.name}?</span>
              <Button
                size="sm"
                variant="danger"
                disabled={removing}
                onClick={onRemoveConfirm}
                data-testid="member-remove-confirm"
              >
                {removing ? 'Removing…' : 'Remove'}
              </Button>
              <Button size="sm" variant="quiet" disabled={removing} onClick={onRemoveCancel}>
                Keep
              </Button>
            </span>
          ) : (
            <Button
              size="sm"
              variant="quiet"
              onClick={onRemoveAsk}
              aria-label={`Remove ${member.name}`}
              data-testid={`member-remove-${member.email}`}
            >
              Remove
            </Button>
          )}
        </td>
      ) : null}
    </tr>
  );
}
