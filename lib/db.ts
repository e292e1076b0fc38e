import pg from 'pg';
import { Sequelize } from 'sequelize';
import { initModels } from '@/models';
import { serverEnv } from '@/lib/env';

const holder = globalThis as unknown as { airproofSequelize?: Sequelize };

/** The one Sequelize instance of this process, with every model initialised. */
export function getSequelize(): Sequelize {
  if (!holder.airproofSequelize) {
    const sequelize = new Sequelize(serverEnv().DATABASE_URL, {
      dialect: 'postgres',
      // Passing the driver avoids Sequelize's dynamic require, which bundlers break.
      dialectModule: pg,
      logging: false,
      pool: { max: 10, idle: 10_000 },
    });
    initModels(sequelize);
    holder.airproofSequelize = sequelize;
  }
  return holder.airproofSequelize;
}

export async function closeSequelize(): Promise<void> {
  const sequelize = holder.airproofSequelize;
  holder.airproofSequelize = undefined;
  await sequelize?.close();
}
