import { beforeEach, describe, expect, it } from 'vitest';
import type { Role } from '../access/permissions';
import { FakeAudit, fakeDatabase, FakeMemberships, FakeTable, refusalOf, userNamed } from '../common/testing/service-fakes';
import type { MembersRepository } from './members.repository';
import type { MembershipRow, MembershipsRepository } from './memberships.repository';
import { MembersService } from './members.service';

const PROJECT = 'project-1';

/** Memberships of one project in memory, behind the repository methods the service uses. */
class FakeMembershipRows extends FakeTable<{ id: string; userId: string; projectId: string; role: Role }> {
  repository(access: FakeMemberships): MembershipsRepository {
    const view = (row: { id: string; userId: string; projectId: string; role: Role }): MembershipRow =>
      ({ id: row.id, role: row.role, user: { id: row.userId, email: `${row.userId}@fake.test` }, project: { id: row.projectId } }) as MembershipRow;
    const find = (projectId: string, userId: string) => this.all().find((row) => row.projectId === projectId && row.userId === userId);
    return {
      find: async (projectId: string, userId: string) => {
        const row = find(projectId, userId);
        return row ? view(row) : undefined;
      },
      countAdmins: async (projectId: string) => this.all().filter((row) => row.projectId === projectId && row.role === 'ADMIN').length,
      upsert: async (projectId: string, userId: string, role: Role) => {
        const row = find(projectId, userId)!;
        this.rows.set(row.id, { ...row, role });
        access.set(userId, projectId, role);
      },
      remove: async (projectId: string, userId: string) => {
        const row = find(projectId, userId);
        if (row) this.rows.delete(row.id);
        access.set(userId, projectId, undefined);
        return row ? 1 : 0;
      },
    } as unknown as MembershipsRepository;
  }
}

let table: FakeMembershipRows;
let audit: FakeAudit;
let service: MembersService;
const admin = userNamed('ada');
const researcher = userNamed('rene');
const outsider = userNamed('otto');

function setUp(members: [string, Role][]) {
  const access = new FakeMemberships();
  table = new FakeMembershipRows(members.map(([userId, role]) => ({ id: `m-${userId}`, userId, projectId: PROJECT, role })));
  for (const [userId, role] of members) access.set(userId, PROJECT, role);
  audit = new FakeAudit();
  const locks = { lockProject: async () => true } as unknown as MembersRepository;
  service = new MembersService(fakeDatabase([table]), table.repository(access), locks, access.accessService(), audit.service());
}

const roleOf = (userId: string) => table.all().find((row) => row.userId === userId)?.role;

describe(MembersService.name, () => {
  beforeEach(() => setUp([[admin.id, 'ADMIN'], [researcher.id, 'RESEARCHER'], ['user-vic', 'VIEWER']]));

  it('lets an admin change a role and records who changed it from what to what', async () => {
    const updated = await service.setRole(admin, { projectId: PROJECT, userId: 'user-vic', role: 'ANALYST' });
    expect(updated.role).toBe('ANALYST');
    expect(roleOf('user-vic')).toBe('ANALYST');
    expect(audit.entries).toEqual([
      expect.objectContaining({ actor: admin, action: 'update', objectType: 'membership', before: expect.objectContaining({ role: 'VIEWER' }), after: expect.objectContaining({ role: 'ANALYST' }) }),
    ]);
  });

  it('refuses a researcher (FORBIDDEN) and someone outside the project (NOT_FOUND), changing nothing', async () => {
    expect((await refusalOf(() => service.setRole(researcher, { projectId: PROJECT, userId: 'user-vic', role: 'ADMIN' }))).code).toBe('FORBIDDEN');
    expect((await refusalOf(() => service.remove(researcher, PROJECT, 'user-vic'))).code).toBe('FORBIDDEN');
    expect((await refusalOf(() => service.setRole(outsider, { projectId: PROJECT, userId: 'user-vic', role: 'ADMIN' }))).code).toBe('NOT_FOUND');
    expect(roleOf('user-vic')).toBe('VIEWER');
    expect(audit.entries).toEqual([]);
  });

  it('keeps the last admin: neither demoted nor removed, with the field named', async () => {
    const demoted = await refusalOf(() => service.setRole(admin, { projectId: PROJECT, userId: admin.id, role: 'VIEWER' }));
    expect(demoted).toMatchObject({ code: 'BAD_USER_INPUT', field: 'role' });
    const removed = await refusalOf(() => service.remove(admin, PROJECT, admin.id));
    expect(removed).toMatchObject({ code: 'BAD_USER_INPUT', field: 'userId' });
    expect(roleOf(admin.id)).toBe('ADMIN');
    expect(audit.entries).toEqual([]);
  });

  it('lets an admin step down or leave once another admin exists', async () => {
    await service.setRole(admin, { projectId: PROJECT, userId: researcher.id, role: 'ADMIN' });
    await service.setRole(admin, { projectId: PROJECT, userId: admin.id, role: 'RESEARCHER' });
    expect(roleOf(admin.id)).toBe('RESEARCHER');
    expect(await service.remove(researcher, PROJECT, admin.id)).toBe(true);
    expect(roleOf(admin.id)).toBeUndefined();
    expect(audit.entries.map((entry) => entry.action)).toEqual(['update', 'update', 'delete']);
  });

  it('answers NOT_FOUND for someone who is not a member', async () => {
    expect((await refusalOf(() => service.setRole(admin, { projectId: PROJECT, userId: 'user-nobody', role: 'VIEWER' }))).code).toBe('NOT_FOUND');
    expect((await refusalOf(() => service.remove(admin, PROJECT, 'user-nobody'))).code).toBe('NOT_FOUND');
  });
});
