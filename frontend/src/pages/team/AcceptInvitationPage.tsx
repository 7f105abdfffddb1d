import { Callout, Intent } from '@blueprintjs/core';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { AcceptInvitationForm } from '@/modules/team/components/AcceptInvitationForm';
import { PublicPageCard } from '@/modules/team/components/PublicPageCard';

export function AcceptInvitationPage() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const token = search.get('token') ?? '';
  const handleAccepted = (projectId: string | null) => navigate(projectId ? paths.project(projectId) : paths.projects(), { replace: true });
  return (
    <PublicPageCard title="Join a project" lead="You were invited to a Stratochron project. Choose how you appear and a password.">
      {token === '' ? (
        <Callout intent={Intent.WARNING} className="sc-form-callout">
          This link has no invitation token. Open the link from the invitation e-mail as it is.
        </Callout>
      ) : (
        <AcceptInvitationForm token={token} onAccepted={handleAccepted} />
      )}
    </PublicPageCard>
  );
}
