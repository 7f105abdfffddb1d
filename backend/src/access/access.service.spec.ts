import { describe, expect, it } from 'vitest';
import type { AccessRepository } from './access.repository';
import { AccessService } from './access.service';
import { Permission, Role } from './permissions';

/** A membership table that counts its reads and answers each only when told to. */
function slowMemberships(roles: Map<string, Role>) {
  const waiting: (() => void)[] = [];
  let reads = 0;
  const repository = {
    roleOf: (userId: string, projectId: string) => {
      reads += 1;
      return new Promise<Role | undefined>((resolve) => waiting.push(() => resolve(roles.get(`${userId} ${projectId}`))));
    },
  } as unknown as AccessRepository;
  return {
    service: new AccessService(repository),
    reads: () => reads,
    answerAll: () => waiting.splice(0).forEach((answer) => answer()),
  };
}

const vic = { id: 'user-vic', email: 'vic@stratochron.test' };

describe(AccessService.name, () => {
  it('shares one membership read between checks made at the same time (the parallel fields of one query)', async () => {
    const table = slowMemberships(new Map([['user-vic project-1', 'VIEWER' as Role]]));
    const checks = Promise.all([
      table.service.requireAccess({ user: vic, permission: Permission.ProjectRead, projectId: 'project-1' }),
      table.service.roleOf(vic, 'project-1'),
      table.service.roleOf(vic, 'project-2'),
    ]);
    await Promise.resolve();
    table.answerAll();
    expect(await checks).toEqual(['VIEWER', 'VIEWER', undefined]);
    expect(table.reads()).toBe(2);
  });

  it('reads again once a read is answered, so a later check sees a changed role', async () => {
    const roles = new Map<string, Role>([['user-vic project-1', 'RESEARCHER']]);
    const table = slowMemberships(roles);
    const first = table.service.roleOf(vic, 'project-1');
    table.answerAll();
    expect(await first).toBe('RESEARCHER');
    roles.set('user-vic project-1', 'VIEWER');
    const second = table.service.requireAccess({ user: vic, permission: Permission.StratigraphyWrite, projectId: 'project-1' });
    table.answerAll();
    await expect(second).rejects.toMatchObject({ code: 'FORBIDDEN' });
    expect(table.reads()).toBe(2);
  });
});
