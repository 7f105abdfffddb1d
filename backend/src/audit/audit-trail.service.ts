import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission, roleAllows } from '../access/permissions';
import { AuthUser } from '../auth/auth-user';
import { badInput } from '../common/errors/domain-error';
import { users } from '../database/schema';
import { decodeAuditCursor, encodeAuditCursor } from './audit-cursor';
import { AuditRepository } from './audit.repository';
import { AUDIT_PAGE_DEFAULT, AuditTrailInput } from './dto/audit-trail.input';

export interface AuditRecordView {
  id: string;
  at: Date;
  actor: typeof users.$inferSelect | null;
  action: string;
  objectType: string;
  objectId: string;
  before: unknown;
  after: unknown;
}

export interface AuditConnection {
  edges: Array<{ cursor: string; node: AuditRecordView }>;
  pageInfo: { endCursor: string | null; hasNextPage: boolean };
}

/**
 * Object types whose audit images only readers with a permission may see, as the API's own
 * fields show them: pending invitations (addresses, roles) to those who manage members.
 */
const REDACTED_IMAGES: Readonly<Record<string, Permission>> = {
  invitation: Permission.MembersManage,
};

/**
 * The project's audit trail, newest first, filtered and paginated by cursor. Records of objects
 * the reader's role may not see keep who, when, what action and which object, without their
 * before and after images.
 */
@Injectable()
export class AuditTrailService {
  constructor(
    private readonly audit: AuditRepository,
    private readonly access: AccessService,
  ) {}

  async trail(user: AuthUser, input: AuditTrailInput): Promise<AuditConnection> {
    const role = await this.access.requireAccess({ user, permission: Permission.AuditRead, projectId: input.projectId });
    const hidden = (objectType: string) => Object.hasOwn(REDACTED_IMAGES, objectType) && !roleAllows(role, REDACTED_IMAGES[objectType]);
    const first = input.first ?? AUDIT_PAGE_DEFAULT;
    const beforeSeq = input.after === undefined ? undefined : decodeAuditCursor(input.after);
    if (input.after !== undefined && beforeSeq === undefined) throw badInput('after', 'this cursor is not from the audit trail');
    if (input.from && input.to && input.from > input.to) throw badInput('to', '"to" must not be before "from"');
    // One record more than asked tells whether another page follows.
    const rows = await this.audit.list({
      projectId: input.projectId,
      actorId: input.actorId,
      objectType: input.objectType,
      objectId: input.objectId,
      from: input.from,
      to: input.to,
      beforeSeq,
      limit: first + 1,
    });
    const page = rows.slice(0, first);
    const edges = page.map(({ record, actor }) => ({
      cursor: encodeAuditCursor(record.seq),
      node: {
        id: String(record.seq),
        at: record.at,
        actor,
        action: record.action,
        objectType: record.objectType,
        objectId: record.objectId,
        before: hidden(record.objectType) ? null : record.before,
        after: hidden(record.objectType) ? null : record.after,
      },
    }));
    return { edges, pageInfo: { endCursor: edges.at(-1)?.cursor ?? null, hasNextPage: rows.length > first } };
  }
}
