import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { AcceptInvitationForm } from '@/modules/team/components/AcceptInvitationForm';
import { PublicPageCard } from '@/modules/team/components/PublicPageCard';
import { teamQueries } from '@/modules/team/hooks/teamQueries';
import { LoadingState } from '@/modules/ui/components/LoadingState';

/** Opens an invitation link: the form while the link can be used, else what happened to it. */
export function AcceptInvitationPage() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const token = search.get('token') ?? '';
  const link = useQuery({ ...teamQueries.invitationLink(token), enabled: token !== '' });
  const handleAccepted = (projectId: string | null) => navigate(projectId ? paths.project(projectId) : paths.projects(), { replace: true });
  const toSignIn = <Button intent={Intent.PRIMARY} icon={IconNames.LOG_IN} text="Sign in" onClick={() => navigate(paths.signIn())} />;

  const body = (() => {
    if (token === '') {
      return (
        <Callout intent={Intent.WARNING} className="sc-form-callout">
          This link has no invitation token. Open the link from the invitation e-mail as it is.
        </Callout>
      );
    }
    if (link.isPending) return <LoadingState label="Checking the invitation" />;
    switch (link.data?.status) {
      case 'USED':
        return (
          <Callout intent={Intent.PRIMARY} icon={IconNames.TICK_CIRCLE} title="This invitation was already used" className="sc-form-callout">
            It has been used to join {link.data.projectName ?? 'the project'}, and a link works once. Sign in with that account to open the project.
            <div className="sc-callout-actions">{toSignIn}</div>
          </Callout>
        );
      case 'EXPIRED':
        return (
          <Callout intent={Intent.WARNING} icon={IconNames.TIME} title="This invitation has expired" className="sc-form-callout">
            Ask an admin of {link.data.projectName ?? 'the project'} to invite you again; the new e-mail brings a fresh link.
          </Callout>
        );
      case 'UNKNOWN':
        return (
          <Callout intent={Intent.WARNING} icon={IconNames.DISABLE} title="This invitation link is not valid" className="sc-form-callout">
            Check that the whole link from the e-mail was opened; a link cut short by a mail program names no invitation.
          </Callout>
        );
      default:
        // OPEN, or the check itself failed: the form's own answer then says what is wrong.
        return <AcceptInvitationForm token={token} onAccepted={handleAccepted} />;
    }
  })();

  return (
    <PublicPageCard
      title={link.data?.projectName ? `Join ${link.data.projectName}` : 'Join a project'}
      lead="You were invited to a Stratochron project. Choose how you appear and a password."
    >
      {body}
    </PublicPageCard>
  );
}
