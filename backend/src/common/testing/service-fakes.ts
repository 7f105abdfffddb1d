/**
 * Fakes for service unit specs: no database, no Nest. A service is built with `new` from these
 * and in-memory fake repositories written in its spec, so a spec checks the service's own rules
 * (access, validation, what is written and audited) and fails when one is removed.
 */
import { AccessService } from '../../access/access.service';
import type { AccessRepository } from '../../access/access.repository';
import type { Role } from '../../access/permissions';
import type { AuditEntry, AuditService } from '../../audit/audit.service';
import type { AuthUser } from '../../auth/auth-user';
import type { DatabaseService, Executor } from '../../database/database.service';
import { DomainError } from '../../common/errors/domain-error';

/** The handle fake repositories receive for a transaction (never used as a database). */
export const FAKE_TX = { fake: 'transaction' } as unknown as Executor;

/**
 * A `DatabaseService` whose transactions run `work` with `FAKE_TX`. Fake repositories should
 * write through `snapshot`/`restore` (see `FakeTable`) so a refused write leaves nothing behind.
 */
export function fakeDatabase(tables: readonly { snapshot(): unknown; restore(state: unknown): void }[] = []): DatabaseService {
  return {
    async transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
      const states = tables.map((table) => table.snapshot());
      try {
        return await work(FAKE_TX);
      } catch (error) {
        tables.forEach((table, i) => table.restore(states[i]));
        throw error;
      }
    },
  } as unknown as DatabaseService;
}

/** Rows by id, copied on snapshot so a failed transaction rolls back. */
export class FakeTable<T extends { id: string }> {
  rows = new Map<string, T>();

  constructor(rows: readonly T[] = []) {
    for (const row of rows) this.rows.set(row.id, { ...row });
  }

  snapshot(): Map<string, T> {
    return new Map([...this.rows].map(([id, row]) => [id, { ...row }]));
  }

  restore(state: unknown): void {
    this.rows = state as Map<string, T>;
  }

  all(): T[] {
    return [...this.rows.values()];
  }
}

/** Members of projects, for the real `AccessService` over a fake repository. */
export class FakeMemberships {
  private readonly roles = new Map<string, Role>();

  set(userId: string, projectId: string, role: Role | undefined): void {
    if (role) this.roles.set(`${userId}/${projectId}`, role);
    else this.roles.delete(`${userId}/${projectId}`);
  }

  roleOf(userId: string, projectId: string): Role | undefined {
    return this.roles.get(`${userId}/${projectId}`);
  }

  /** The real access rules (`AccessService` and the role table) over these memberships. */
  accessService(): AccessService {
    const repository = { roleOf: async (userId: string, projectId: string) => this.roleOf(userId, projectId) } as unknown as AccessRepository;
    return new AccessService(repository);
  }
}

/** An `AuditService` that keeps what it is asked to record. */
export class FakeAudit {
  readonly entries: AuditEntry[] = [];

  service(): AuditService {
    return {
      record: async (_executor: Executor, entry: AuditEntry) => {
        this.entries.push(entry);
      },
      recordMany: async (_executor: Executor, entries: AuditEntry[]) => {
        this.entries.push(...entries);
      },
    } as unknown as AuditService;
  }
}

/** A signed-in user. */
export function userNamed(name: string): AuthUser {
  return { id: `user-${name}`, email: `${name}@fake.test` } as AuthUser;
}

/** The code (and field) of the DomainError `work` throws; fails when it throws nothing. */
export async function refusalOf(work: () => Promise<unknown>): Promise<{ code: string; field?: string; message: string }> {
  try {
    await work();
  } catch (error) {
    if (error instanceof DomainError) return { code: error.code, field: error.field, message: error.message };
    throw error;
  }
  throw new Error('expected a refusal, but the call succeeded');
}
