import { Sequelize } from 'sequelize';

import type { Config } from '../config.js';

export function createSequelize(config: Config): Sequelize {
  return new Sequelize(config.DB_NAME, config.DB_USER, config.DB_PASSWORD, {
    host: config.DB_HOST,
    port: config.DB_PORT,
    dialect: 'mariadb',
    logging: false,
    timezone: '+00:00',
    // Short timeouts so a lost database answers 503 quickly instead of hanging.
    pool: { max: config.DB_POOL_MAX, min: 0, acquire: 4000, idle: 10000, evict: 5000 },
    dialectOptions: { connectTimeout: 2000, bigIntAsNumber: true, decimalAsNumber: true },
    define: { underscored: true },
  });
}
