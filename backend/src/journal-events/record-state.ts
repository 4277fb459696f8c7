import type { EntityManager } from '@mikro-orm/mariadb';

/**
 * The full state of a record as a JSON-ready object with the entity's property names (camelCase),
 * dates as ISO-8601 UTC strings: what a journal event carries so a read model can be rebuilt from the
 * journal alone. Works for managed entities and for plain rows of a bulk insert alike.
 */
export function recordState(em: EntityManager, entityName: string, record: object): Record<string, unknown> {
  const meta = em.getMetadata().get(entityName);
  const out: Record<string, unknown> = {};
  for (const prop of meta.props) {
    const value = (record as Record<string, unknown>)[prop.name];
    out[prop.name] = value instanceof Date ? value.toISOString() : value === undefined ? null : value;
  }
  return out;
}
