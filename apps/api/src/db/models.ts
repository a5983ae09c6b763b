import type { Sequelize } from 'sequelize';

import { initAuditModels } from '../components/audit/model.js';
import { initProductLineModel } from '../components/product-lines/model.js';
import { initUserModel } from '../components/users/model.js';

/** Binds every model to this Sequelize instance (called once per app start). */
export function initModels(sequelize: Sequelize): void {
  initUserModel(sequelize);
  initAuditModels(sequelize);
  initProductLineModel(sequelize);
}
