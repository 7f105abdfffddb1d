import { Button, Callout, Classes, HTMLSelect, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type ChangeEvent } from 'react';
import type { ProjectTeamQuery, Role } from '@/gql/graphql';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { useSession } from '@/modules/auth/hooks/useSession';
import { ROLE_LABELS } from '@/modules/auth/utils/permissions';
import { useTeamMutations } from '@/modules/team/hooks/teamQueries';
import { ROLES } from '@/modules/team/utils/teamForms';
import { DeleteAlert } from '@/modules/ui/components/DeleteAlert';
import './team.css';

export type MemberRow = ProjectTeamQuery['project']['members'][number];

export type MembersPanelProps = {
  projectId: string;
  members: readonly MemberRow[];
  canManage: boolean;
};

/**
 * The project's members with their roles. An admin changes roles and removes members; the
 * server keeps the last admin and its refusal is shown here.
 */
export function MembersPanel({ projectId, members, canManage }: MembersPanelProps) {
  const session = useSession();
  const { setRole, remove } = useTeamMutations(projectId);
  const [removing, setRemoving] = useState<MemberRow | null>(null);
  const sorted = [...members].sort((a, b) => a.user.displayName.localeCompare(b.user.displayName));

  const handleRoleChange = (member: MemberRow) => (event: ChangeEvent<HTMLSelectElement>) => {
    remove.reset();
    setRole.mutate({ input: { projectId, userId: member.user.id, role: event.target.value as Role } });
  };
  const handleRemove = () => {
    if (!removing) return;
    remove.mutate({ projectId, userId: removing.user.id }, { onSuccess: () => setRemoving(null) });
  };
  const handleCancelRemove = () => {
    remove.reset();
    setRemoving(null);
  };

  const roleError = formErrorOf(setRole.error, []);
  return (
    <div>
      {roleError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {roleError}
        </Callout>
      )}
      <HTMLTable compact striped className="sc-table sc-table-fill">
        <thead>
          <tr>
            <th>Name</th>
            <th>E-mail</th>
            <th>Role</th>
            {canManage && <th aria-label="Actions" />}
          </tr>
        </thead>
        <tbody>
          {sorted.map((member) => (
            <tr key={member.id}>
              <td>
                {member.user.displayName}{' '}
                {member.user.id === session?.user.id && (
                  <Tag minimal round>
                    you
                  </Tag>
                )}
              </td>
              <td className="num">{member.user.email}</td>
              <td>
                {canManage ? (
                  <HTMLSelect
                    aria-label={`Role of ${member.user.displayName}`}
                    value={member.role}
                    onChange={handleRoleChange(member)}
                    disabled={setRole.isPending}
                    minimal
                  >
                    {ROLES.map((role) => (
                      <option key={role} value={role}>
                        {ROLE_LABELS[role]}
                      </option>
                    ))}
                  </HTMLSelect>
                ) : (
                  ROLE_LABELS[member.role]
                )}
              </td>
              {canManage && (
                <td className="sc-actions-cell">
                  <Button
                    icon={IconNames.REMOVE}
                    variant="minimal"
                    intent={Intent.DANGER}
                    aria-label={`Remove ${member.user.displayName}`}
                    title="Remove from the project"
                    onClick={() => setRemoving(member)}
                  />
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      {!canManage && <p className={`${Classes.TEXT_MUTED} ${Classes.TEXT_SMALL}`}>Only a project admin changes roles and members.</p>}
      <DeleteAlert
        what={
          removing ? (
            <>
              <strong>{removing.user.displayName}</strong> from the project (their past changes stay attributed to them)
            </>
          ) : null
        }
        onConfirm={handleRemove}
        onCancel={handleCancelRemove}
        deleting={remove.isPending}
        error={remove.error}
      />
    </div>
  );
}
