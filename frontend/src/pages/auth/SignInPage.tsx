import { Card, Classes, Elevation, H1 } from '@blueprintjs/core';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { afterSignInPath, paths } from '@/app/paths';
import { SignInForm } from '@/modules/auth/components/SignInForm';
import { useSession } from '@/modules/auth/hooks/useSession';

/** The demo accounts are shown where the app runs locally or in development. */
const SHOW_DEMO_HINT = import.meta.env.DEV || ['localhost', '127.0.0.1'].includes(window.location.hostname);

export function SignInPage() {
  const session = useSession();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const next = afterSignInPath(search.get('next'));
  if (session) return <Navigate to={next} replace />;
  return (
    <div className="sc-signin-page">
      <Card elevation={Elevation.ONE} className="sc-signin-card">
        <H1 className="sc-signin-title">Stratochron</H1>
        <p className={`${Classes.TEXT_MUTED} sc-signin-tagline`}>Chronologies of past earthquakes, from lab results to recurrence.</p>
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
        <p className={Classes.TEXT_SMALL}>
          <Link to={paths.forgotPassword()}>Forgot password?</Link>
        </p>
        {SHOW_DEMO_HINT && (
          <p className={`${Classes.TEXT_SMALL} ${Classes.TEXT_MUTED} sc-demo-hint`}>
            Demo accounts: <span className="num">researcher@demo.test</span>, <span className="num">admin@demo.test</span>,{' '}
            <span className="num">viewer@demo.test</span> (also correlator@ and analyst@), password <span className="num">stratochron-demo</span>.
          </p>
        )}
      </Card>
    </div>
  );
}
