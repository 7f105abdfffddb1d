import { Callout, Intent } from '@blueprintjs/core';
import { Link, useSearchParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { PublicPageCard } from '@/modules/team/components/PublicPageCard';
import { ResetPasswordForm } from '@/modules/team/components/ResetPasswordForm';

export function ResetPasswordPage() {
  const [search] = useSearchParams();
  const token = search.get('token') ?? '';
  return (
    <PublicPageCard title="Choose a new password" lead="The link from the e-mail works once.">
      {token === '' ? (
        <Callout intent={Intent.WARNING} className="sc-form-callout">
          This link has no reset token. <Link to={paths.forgotPassword()}>Ask for a new link</Link>.
        </Callout>
      ) : (
        <ResetPasswordForm token={token} />
      )}
    </PublicPageCard>
  );
}
