import { Button, Callout, Classes, HTMLTable, Intent, NonIdealState, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import type { ProjectTeamQuery, Role } from '@/gql/graphql';
import { fieldErrorsOf, formErrorOf } from '@/modules/api/utils/apiError';
import { ROLE_LABELS } from '@/modules/auth/utils/permissions';
import { useTeamMutations } from '@/modules/team/hooks/teamQueries';
import { readInvitation, ROLES, type InvitationField } from '@/modules/team/utils/teamForms';
import { SelectField, TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';
import './team.css';

export type InvitationRow = ProjectTeamQuery['project']['invitations'][number];

export type InvitationsPanelProps = {
  projectId: string;
  invitations: readonly InvitationRow[];
};

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

/** Where an invitation stands, from its dates. */
function invitationState(invitation: InvitationRow, now: number): { label: string; intent: Intent } {
  if (invitation.acceptedAt) return { label: 'accepted', intent: Intent.SUCCESS };
  if (Date.parse(invitation.expiresAt) < now) return { label: 'expired', intent: Intent.NONE };
  return { label: 'pending', intent: Intent.WARNING };
}

/** Invite someone by e-mail with a role (admins only), and the invitations sent so far. */
export function InvitationsPanel({ projectId, invitations }: InvitationsPanelProps) {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('RESEARCHER');
  const [errors, setErrors] = useState<FieldErrors<InvitationField>>({});
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { invite } = useTeamMutations(projectId);
  const [now] = useState(() => Date.now());

  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readInvitation(email, role);
    setErrors(result.ok ? {} : result.errors);
    if (!result.ok) return;
    setSentTo(null);
    invite.mutate(
      { input: { projectId, ...result.input } },
      {
        onSuccess: ({ inviteMember: { email: address } }) => {
          setSentTo(address);
          setEmail('');
        },
      },
    );
  };

  const serverErrors = fieldErrorsOf(invite.error);
  const formError = formErrorOf(invite.error, ['email', 'role']);
  const pendingFirst = [...invitations].sort((a, b) => Number(Boolean(a.acceptedAt)) - Number(Boolean(b.acceptedAt)));

  return (
    <div>
      <form onSubmit={handleSubmit} noValidate className="sc-invite-form">
        <TextField
          name="inviteEmail"
          label="E-mail"
          type="email"
          value={email}
          onValueChange={setEmail}
          error={errors.email ?? serverErrors.email}
          placeholder="colleague@institute.example"
        />
        <SelectField name="inviteRole" label="Role" value={role} options={ROLE_OPTIONS} onValueChange={setRole} error={serverErrors.role} fill={false} />
        <Button type="submit" icon={IconNames.ENVELOPE} text="Send invitation" intent={Intent.PRIMARY} loading={invite.isPending} />
      </form>
      {formError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formError}
        </Callout>
      )}
      {sentTo && (
        <Callout intent={Intent.SUCCESS} icon={IconNames.TICK} className="sc-form-callout">
          Invitation sent to <span className="num">{sentTo}</span>.
        </Callout>
      )}
      {pendingFirst.length === 0 ? (
        <NonIdealState icon={IconNames.ENVELOPE} title="No invitations yet" />
      ) : (
        <HTMLTable compact striped className="sc-table sc-table-fill">
          <thead>
            <tr>
              <th>E-mail</th>
              <th>Role</th>
              <th>State</th>
              <th>Expires</th>
            </tr>
          </thead>
          <tbody>
            {pendingFirst.map((invitation) => {
              const state = invitationState(invitation, now);
              return (
                <tr key={invitation.id}>
                  <td className="num">{invitation.email}</td>
                  <td>{ROLE_LABELS[invitation.role]}</td>
                  <td>
                    <Tag minimal intent={state.intent}>
                      {state.label}
                    </Tag>
                  </td>
                  <td className={`num ${Classes.TEXT_MUTED}`}>{new Date(invitation.expiresAt).toLocaleString()}</td>
                </tr>
              );
            })}
          </tbody>
        </HTMLTable>
      )}
    </div>
  );
}
