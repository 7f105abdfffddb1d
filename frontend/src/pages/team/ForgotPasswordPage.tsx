import { ForgotPasswordForm } from '@/modules/team/components/ForgotPasswordForm';
import { PublicPageCard } from '@/modules/team/components/PublicPageCard';

export function ForgotPasswordPage() {
  return (
    <PublicPageCard title="Forgot password" lead="Give the e-mail address you sign in with; we send a link to choose a new password.">
      <ForgotPasswordForm />
    </PublicPageCard>
  );
}
