import type { Connection } from '@mikro-orm/core';

const ident = (name: string) => `"${name.replace(/"/g, '""')}"`;

/**
 * Gives the runtime role the rights to use rows, never to change the schema: SELECT, INSERT,
 * UPDATE and DELETE on every table (no TRUNCATE, REFERENCES or TRIGGER), USAGE and SELECT on
 * sequences, USAGE on the schemas (no CREATE). Default privileges give the same on every table
 * the owner creates later in these schemas, so a migration needs no grants of its own. Run by the owner after
 * migrating; running it again changes nothing.
 */
export async function grantRuntimeRole(conn: Connection, role: string, schemaNames: readonly string[]): Promise<void> {
  const who = ident(role);
  const schemas = schemaNames.map(ident).join(', ');
  await conn.execute(
    [
      `grant usage on schema ${schemas} to ${who}`,
      `grant select, insert, update, delete on all tables in schema ${schemas} to ${who}`,
      `grant usage, select on all sequences in schema ${schemas} to ${who}`,
      `alter default privileges in schema ${schemas} grant select, insert, update, delete on tables to ${who}`,
      `alter default privileges in schema ${schemas} grant usage, select on sequences to ${who}`,
    ].join(';\n'),
  );
}
