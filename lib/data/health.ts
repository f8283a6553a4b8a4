import 'server-only';
import type { Sequelize } from 'sequelize';
import { sequelize } from '@/lib/data/db';

/** True when the database answers a trivial query within the timeout. */
export async function databaseUp(db: Sequelize = sequelize, timeoutMs = 3000): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  try {
    return await Promise.race([db.query('SELECT 1').then(() => true as const), timeout]);
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
