import 'server-only';
import type { Client, QueryResult } from 'pg';
import { sequelize } from './db';

// Statements the hot paths send on every request (who is asking, the tap's reads and writes) are prepared once per
// pooled connection, so PostgreSQL plans them once rather than on every request: the PREPARE goes in the round trip
// that first needs it, and each request sends EXECUTE with its values as literals quoted by the driver's own
// `escapeLiteral`. Several may go as one string (simple query protocol), as the quick tap path does.

const statements = new Map<string, string>();
const preparedOn = new WeakMap<Client, Set<string>>();

/** Registers a statement by name (its `$1`, `$2` … take their types from where they stand); returns the name. */
export function definePrepared(name: string, text: string): string {
  const known = statements.get(name);
  if (known !== undefined && known !== text) throw new Error(`prepared statement ${name} defined twice`);
  statements.set(name, text);
  return name;
}

/** The PREPAREs of those statements this connection has not prepared yet ('' when it has them all). */
export function prepareSql(client: Client, names: string[]): string {
  let done = preparedOn.get(client);
  if (!done) preparedOn.set(client, (done = new Set()));
  const missing = names.filter((name) => !done.has(name));
  for (const name of missing) done.add(name);
  return missing.map((name) => `PREPARE ${name} AS ${statements.get(name)};`).join('\n');
}

/** `EXECUTE name(…)` with the values as literals. */
export const executeSql = (client: Client, name: string, args: unknown[]) =>
  `EXECUTE ${name}(${args.map((value) => literal(client, value)).join(', ')})`;

/**
 * Runs `fn` on a connection of the pool. After an error the connection is closed, not pooled: which statements it
 * prepared is then unknown (and a transaction may be open).
 */
export async function withPooledClient<T>(fn: (client: Client) => Promise<T>): Promise<T> {
  const client = (await sequelize.connectionManager.getConnection({ type: 'write' })) as Client;
  try {
    const result = await fn(client);
    sequelize.connectionManager.releaseConnection(client);
    return result;
  } catch (error) {
    await sequelize.connectionManager.destroyConnection(client).catch(() => undefined);
    throw error;
  }
}

/** The rows of one prepared statement, in one round trip. */
export function queryPrepared<T>(name: string, args: unknown[]): Promise<T[]> {
  return withPooledClient(async (client) => {
    const answer = (await client.query(`${prepareSql(client, [name])}\n${executeSql(client, name, args)}`)) as
      QueryResult | QueryResult[];
    return (Array.isArray(answer) ? answer.at(-1)! : answer).rows as T[];
  });
}

/**
 * A value as a SQL literal; PostgreSQL casts it to the type of the parameter or column it fills. Dates go as ISO
 * instants, text arrays as array literals, objects as JSON.
 */
export function literal(client: Client, value: unknown): string {
  if (value === null || value === undefined) return 'NULL';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new Error(`not a finite number: ${value}`);
    return String(value);
  }
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (value instanceof Date) return client.escapeLiteral(value.toISOString());
  if (Array.isArray(value)) return client.escapeLiteral(`{${value.map(arrayElement).join(',')}}`);
  if (typeof value === 'object') return client.escapeLiteral(JSON.stringify(value));
  return client.escapeLiteral(String(value));
}

/** One element of an array literal: double-quoted, with backslashes and quotes escaped (PostgreSQL manual, 8.15.6). */
const arrayElement = (value: unknown) => `"${String(value).replace(/[\\"]/g, (c) => `\\${c}`)}"`;
