import { Button, Intent, NonIdealState } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { Navigate, isRouteErrorResponse, useLocation, useNavigate, useRouteError } from 'react-router-dom';
import { paths } from '@/app/paths';
import { isApiError } from '@/modules/api/utils/apiError';

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** What went wrong while loading or drawing a route, in words a user can act on. */
export function RouteErrorPage() {
  const error = useRouteError();
  const location = useLocation();
  const navigate = useNavigate();
  if (isApiError(error, 'UNAUTHENTICATED')) {
    return <Navigate to={paths.signIn({ next: `${location.pathname}${location.search}` })} replace />;
  }
  const handleRetry = () => navigate(0);
  const toProjects = <Button icon={IconNames.PROJECTS} text="Your projects" onClick={() => navigate(paths.projects())} />;
  if ((isRouteErrorResponse(error) && error.status === 404) || isApiError(error, 'NOT_FOUND')) {
    return (
      <NonIdealState
        className="sc-error-page"
        icon={IconNames.SEARCH}
        title="Not found"
        description={isApiError(error) ? `${capitalise(error.message)}. It may have been deleted.` : 'There is no page at this address.'}
        action={toProjects}
      />
    );
  }
  if (isApiError(error, 'FORBIDDEN')) {
    return (
      <NonIdealState
        className="sc-error-page"
        icon={IconNames.LOCK}
        title="Not in your projects"
        description="This belongs to a project you are not a member of. A project admin can invite you."
        action={toProjects}
      />
    );
  }
  // A server fault's own text is for its log, not for the page (it may quote a statement).
  const message = isApiError(error, 'INTERNAL_SERVER_ERROR')
    ? 'The server could not answer this request. Try again; if it keeps failing, tell whoever runs this server.'
    : error instanceof Error
      ? error.message
      : isRouteErrorResponse(error)
        ? error.statusText
        : 'Unexpected error';
  return (
    <NonIdealState
      className="sc-error-page"
      icon={IconNames.ERROR}
      title="Something went wrong"
      description={message}
      action={<Button intent={Intent.PRIMARY} icon={IconNames.REFRESH} text="Try again" onClick={handleRetry} />}
    />
  );
}
