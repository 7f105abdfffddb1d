import { Card, Classes, Elevation, H4, NonIdealState, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';
import type { ProjectsQuery } from '@/gql/graphql';
import { paths } from '@/app/paths';
import { ROLE_LABELS } from '@/modules/auth/utils/permissions';

const SETTING_LABELS = { SUBDUCTION_INTERFACE: 'Subduction interface', CRUSTAL: 'Crustal faults' } as const;

export type ProjectListProps = {
  projects: ProjectsQuery['projects'];
};

/** The caller's projects as cards, each with its tectonic setting and the caller's role. */
export function ProjectList({ projects }: ProjectListProps) {
  if (projects.length === 0) {
    return (
      <NonIdealState
        icon={IconNames.PROJECTS}
        title="No projects yet"
        description="You are not a member of any project. A project admin can invite you."
      />
    );
  }
  return (
    <div className="sc-project-grid">
      {projects.map((project) => (
        <Link key={project.id} to={paths.project(project.id)} className="sc-card-link">
          <Card interactive elevation={Elevation.ZERO} className="sc-project-card">
            <H4 className="sc-project-card-title">{project.name}</H4>
            <div className="sc-tag-row">
              <Tag minimal className="sc-role-tag">
                {ROLE_LABELS[project.myRole]}
              </Tag>
              <Tag minimal>{SETTING_LABELS[project.tectonicSetting]}</Tag>
            </div>
            {project.description && <p className={`${Classes.TEXT_MUTED} sc-project-card-text`}>{project.description}</p>}
          </Card>
        </Link>
      ))}
    </div>
  );
}
