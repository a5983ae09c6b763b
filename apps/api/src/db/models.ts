import type { Sequelize } from 'sequelize';

import { initAssessmentModel } from '../components/assessments/model.js';
import { initAuditModels } from '../components/audit/model.js';
import { initCandidateModel } from '../components/candidates/model.js';
import { initMailModels } from '../components/mail/model.js';
import { initPasswordTokenModel } from '../components/passwords/model.js';
import { initProductLineModel } from '../components/product-lines/model.js';
import { initRequirementSetModel } from '../components/requirement-sets/model.js';
import { initRevisionModel } from '../components/revisions/model.js';
import { initUserModel } from '../components/users/model.js';

/** Binds every model to this Sequelize instance (called once per app start). */
export function initModels(sequelize: Sequelize): void {
  initUserModel(sequelize);
  initAuditModels(sequelize);
  initProductLineModel(sequelize);
  initRequirementSetModel(sequelize);
  initRevisionModel(sequelize);
  initCandidateModel(sequelize);
  initAssessmentModel(sequelize);
  initMailModels(sequelize);
  initPasswordTokenModel(sequelize);
}
