import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission, Role } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { notFound } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { CreateProjectInput } from './dto/create-project.input';
import { ProjectRow, ProjectsRepository } from './projects.repository';

@Injectable()
export class ProjectsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly projects: ProjectsRepository,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  listMine(user: AuthUser): Promise<ProjectRow[]> {
    return this.projects.listForMember(user.id);
  }

  /** A project the caller is a member of; NOT_FOUND otherwise. */
  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<ProjectRow> {
    await this.access.requireAccess({ user, permission, projectId: id });
    const project = await this.projects.findById(id);
    if (!project) throw notFound('project');
    return project;
  }

  /** Any signed-in user may start a project; they become its first ADMIN. */
  create(user: AuthUser, input: CreateProjectInput): Promise<ProjectRow> {
    return this.database.transaction(async (tx) => {
      const project = await this.projects.insert(
        { name: input.name, description: input.description, tectonicSetting: input.tectonicSetting },
        tx,
      );
      await this.projects.insertFounder(project.id, user.id, tx);
      await this.audit.record(tx, {
        actor: user, projectId: project.id, action: 'create', objectType: 'project', objectId: project.id, after: project,
      });
      return project;
    });
  }

  async myRole(user: AuthUser, projectId: string): Promise<Role> {
    const role = await this.access.roleOf(user, projectId);
    if (!role) throw notFound('project');
    return role;
  }
}
