// `tsx src/db/migrate-cli.ts [up|down|seed|status]`: used by the start and test scripts.
import { loadConfig } from '../config.js';
import { setSequelize } from '../lib/transaction.js';
import { createMigrator } from './migrator.js';
import { initModels } from './models.js';
import { createSeeder } from './seeder.js';
import { createSequelize } from './sequelize.js';

const command = process.argv[2] ?? 'up';
const config = loadConfig();
const sequelize = createSequelize(config);
initModels(sequelize);
setSequelize(sequelize);

try {
  const migrator = createMigrator(sequelize);
  if (command === 'up') {
    const done = await migrator.up();
    console.log(done.length ? `migrations applied: ${done.map((m) => m.name).join(', ')}` : 'migrations: up to date');
  } else if (command === 'down') {
    await migrator.down();
  } else if (command === 'status') {
    console.log(JSON.stringify({ executed: (await migrator.executed()).map((m) => m.name), pending: (await migrator.pending()).map((m) => m.name) }));
  } else if (command === 'seed') {
    const done = await createSeeder(sequelize).up();
    console.log(done.length ? `demo data seeded: ${done.map((m) => m.name).join(', ')}` : 'demo data: already seeded');
  } else {
    console.error(`unknown command ${command}; use up, down, status or seed`);
    process.exitCode = 2;
  }
} finally {
  await sequelize.close();
}
