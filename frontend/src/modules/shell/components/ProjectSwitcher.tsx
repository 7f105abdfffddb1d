import { Button, Menu, MenuDivider, MenuItem, PopoverNext, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { ROLE_LABELS } from '@/modules/auth/utils/permissions';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

export type ProjectSwitcherProps = {
  currentProjectId: string | undefined;
};

/** The current project's name and a menu of the caller's projects with their role in each. */
export function ProjectSwitcher({ currentProjectId }: ProjectSwitcherProps) {
  const { data: projects = [] } = useQuery(projectQueries.list());
  const navigate = useNavigate();
  const current = projects.find((project) => project.id === currentProjectId);
  const menu = (
    <Menu className="sc-project-menu">
      {projects.map((project) => (
        <MenuItem
          key={project.id}
          text={project.name}
          active={project.id === currentProjectId}
          icon={project.id === currentProjectId ? IconNames.TICK : IconNames.BLANK}
          labelElement={<Tag minimal>{ROLE_LABELS[project.myRole]}</Tag>}
          onClick={() => navigate(paths.project(project.id))}
        />
      ))}
      {projects.length > 0 && <MenuDivider />}
      <MenuItem icon={IconNames.PROJECTS} text="All projects" onClick={() => navigate(paths.projects())} />
    </Menu>
  );
  return (
    <PopoverNext content={menu} placement="bottom-start" arrow={false}>
      <Button variant="minimal" icon={IconNames.PROJECTS} endIcon={IconNames.CARET_DOWN} text={current?.name ?? 'Projects'} className="sc-project-switcher" />
    </PopoverNext>
  );
}
