import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { paths } from '@/app/paths';
import { useSession } from '@/modules/auth/hooks/useSession';

export type RequireSessionProps = { children: ReactNode };

/**
 * Shows its children only to a signed-in user; otherwise (and as soon as the session ends,
 * e.g. an expired token) goes to sign-in, remembering where to come back to.
 */
export function RequireSession({ children }: RequireSessionProps) {
  const session = useSession();
  const location = useLocation();
  if (!session) {
    return <Navigate to={paths.signIn({ next: `${location.pathname}${location.search}` })} replace />;
  }
  return children;
}
