import { Button, NonIdealState } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';

export function NotFoundPage() {
  const navigate = useNavigate();
  return (
    <NonIdealState
      className="sc-error-page"
      icon={IconNames.SEARCH}
      title="Not found"
      description="There is no page at this address."
      action={<Button icon={IconNames.PROJECTS} text="Your projects" onClick={() => navigate(paths.projects())} />}
    />
  );
}
