import { Context, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import DataLoader from 'dataloader';
import type { AuditRecordView } from '../audit/audit-trail.service';
import { ProvenanceRepository } from './provenance.repository';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
/** Fields of an audit image that name the object, in order of preference. */
const NAME_FIELDS = ['name', 'labCode', 'fileName', 'email', 'note'] as const;

interface AuditNamesContext {
  auditNames?: DataLoader<string, string | null>;
}

/** Every uuid string in a JSON image (values only, any depth), at most 200. */
export function uuidsIn(value: unknown, found = new Set<string>()): Set<string> {
  if (found.size >= 200) return found;
  if (typeof value === 'string') {
    if (UUID.test(value)) found.add(value.toLowerCase());
  } else if (Array.isArray(value)) {
    for (const item of value) uuidsIn(item, found);
  } else if (value && typeof value === 'object') {
    for (const item of Object.values(value)) uuidsIn(item, found);
  }
  return found;
}

/** A name from an audit image's own fields. */
export function nameInImage(image: unknown): string | null {
  if (!image || typeof image !== 'object') return null;
  const record = image as Record<string, unknown>;
  for (const field of NAME_FIELDS) if (typeof record[field] === 'string' && record[field]) return record[field] as string;
  if (typeof record.number === 'number') return `release ${record.number}`;
  return null;
}

/** Names beside ids in the audit trail, so people read "Tarn Flat", not a UUID (ids stay). */
@Resolver('AuditRecord')
export class AuditNamesResolver {
  constructor(private readonly repository: ProvenanceRepository) {}

  private loader(context: AuditNamesContext): DataLoader<string, string | null> {
    context.auditNames ??= new DataLoader(async (ids) => {
      const names = await this.repository.namesOf(ids);
      return ids.map((id) => names.get(id) ?? null);
    });
    return context.auditNames;
  }

  @ResolveField('objectName')
  async objectName(@Parent() record: AuditRecordView, @Context() context: AuditNamesContext): Promise<string | null> {
    const own = nameInImage(record.after) ?? nameInImage(record.before);
    if (own) return own;
    return UUID.test(record.objectId) ? this.loader(context).load(record.objectId.toLowerCase()) : null;
  }

  @ResolveField('referencedNames')
  async referencedNames(@Parent() record: AuditRecordView, @Context() context: AuditNamesContext) {
    const ids = [...uuidsIn([record.objectId, record.before, record.after])];
    const names = await this.loader(context).loadMany(ids);
    return ids.flatMap((id, i) => (typeof names[i] === 'string' ? [{ id, name: names[i] as string }] : []));
  }
}
