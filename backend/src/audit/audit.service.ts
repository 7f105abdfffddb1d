import { Injectable } from '@nestjs/common';
import { Executor } from '../database/database.service';
import { AuthUser } from '../auth/auth-user';
import { AuditRepository } from './audit.repository';

export type AuditAction = 'create' | 'update' | 'delete' | 'import' | 'install' | 'invite' | 'accept' | 'release' | 'run' | 'cancel' | 'reset';

export interface AuditEntry {
  actor: AuthUser | null;
  projectId: string | null;
  action: AuditAction;
  objectType: string;
  objectId: string;
  before?: unknown;
  after?: unknown;
}

/** Records every write: who, when, what, before and after. Call it inside the write's transaction. */
@Injectable()
export class AuditService {
  constructor(private readonly audit: AuditRepository) {}

  record(executor: Executor, entry: AuditEntry): Promise<void> {
    return this.audit.insert(toRow(entry), executor);
  }

  recordMany(executor: Executor, entries: AuditEntry[]): Promise<void> {
    return this.audit.insertMany(entries.map(toRow), executor);
  }
}

function toRow(entry: AuditEntry) {
  return {
    projectId: entry.projectId,
    actorId: entry.actor?.id ?? null,
    action: entry.action,
    objectType: entry.objectType,
    objectId: entry.objectId,
    before: entry.before === undefined ? null : jsonSafe(entry.before),
    after: entry.after === undefined ? null : jsonSafe(entry.after),
  };
}

/** Drop bulky computed fields (cached calibrations) from audit images; keep what a person entered. */
function jsonSafe(value: unknown): unknown {
  if (value && typeof value === 'object') {
    const { calibration: _calibration, ...rest } = value as Record<string, unknown>;
    return JSON.parse(JSON.stringify(rest));
  }
  return value;
}
