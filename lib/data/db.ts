import 'server-only';
import pg from 'pg';
import { Sequelize } from 'sequelize';
import { env } from '@/lib/env';

// One Sequelize instance per process; kept on globalThis so dev hot reloads do not open new pools.
const globalForDb = globalThis as unknown as { setlineSequelize?: Sequelize };

function createSequelize() {
  return new Sequelize(env().DATABASE_URL, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    timezone: '+00:00',
    pool: { max: env().DATABASE_POOL_MAX, min: 0, idle: 10_000 },
    define: { underscored: true },
  });
}

export const sequelize: Sequelize = globalForDb.setlineSequelize ?? createSequelize();
if (env().NODE_ENV !== 'production') globalForDb.setlineSequelize = sequelize;
