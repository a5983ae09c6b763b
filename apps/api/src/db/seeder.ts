import type { Sequelize, Transaction } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

import * as demo0001 from './seeds/0001-demo-company.js';
import * as demo0002 from './seeds/0002-demo-workflow.js';

// Demo seeds run once each (recorded in seed_runs), each in one transaction.
const seeds: { name: string; up: (t: Transaction) => Promise<void> }[] = [
  { name: '0001-demo-company', up: demo0001.up },
  { name: '0002-demo-workflow', up: demo0002.up },
];

export function createSeeder(sequelize: Sequelize): Umzug<Sequelize> {
  return new Umzug({
    migrations: seeds.map((s) => ({
      name: s.name,
      up: ({ context }) => context.transaction((t) => s.up(t)),
    })),
    context: sequelize,
    storage: new SequelizeStorage({ sequelize, tableName: 'seed_runs' }),
    logger: undefined,
  });
}
