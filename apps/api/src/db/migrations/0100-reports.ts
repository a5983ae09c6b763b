import { DataTypes, type QueryInterface } from 'sequelize';

// Signed compliance reports. A row is written once, when the signed PDF is in
// the archive, and never changed or removed: triggers refuse UPDATE and
// DELETE in the database itself (SQLSTATE 45000), not only in the API.
// report_counters hands out the yearly report numbers under a row lock, so a
// failed signing (rolled back) leaves no gap.
const FROZEN_MESSAGE = 'report_frozen: a compliance report is never changed or deleted';

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('report_counters', {
    year: { type: DataTypes.SMALLINT.UNSIGNED, primaryKey: true },
    last_value: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
  });
  await qi.createTable('reports', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    number: { type: DataTypes.STRING(24), allowNull: false, unique: true },
    assessment_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assessments', key: 'id' } },
    candidate_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'candidates', key: 'id' } },
    product_line_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'product_lines', key: 'id' } },
    revision_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'revisions', key: 'id' } },
    verdict: { type: DataTypes.STRING(16), allowNull: false },
    engine_version: { type: DataTypes.STRING(32), allowNull: false },
    signer_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    signer_name: { type: DataTypes.STRING(120), allowNull: false },
    signer_email: { type: DataTypes.STRING(254), allowNull: false },
    meaning: { type: DataTypes.STRING(16), allowNull: false },
    signed_at: { type: DataTypes.DATE(3), allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    byte_size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    storage_bucket: { type: DataTypes.STRING(63), allowNull: false },
    storage_key: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    audit_head_id: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
    audit_head_hash: { type: DataTypes.CHAR(64), allowNull: false },
    signing_cert_sha256: { type: DataTypes.CHAR(64), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('reports', ['product_line_id', 'id'], { name: 'reports_line' });
  await qi.addIndex('reports', ['candidate_id', 'id'], { name: 'reports_candidate' });
  await qi.addIndex('reports', ['assessment_id'], { name: 'reports_assessment' });
  await qi.addIndex('reports', ['signing_cert_sha256'], { name: 'reports_cert' });
  await qi.sequelize.query(`
    CREATE TRIGGER reports_frozen_update BEFORE UPDATE ON reports FOR EACH ROW
    BEGIN
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${FROZEN_MESSAGE}';
    END`);
  await qi.sequelize.query(`
    CREATE TRIGGER reports_frozen_delete BEFORE DELETE ON reports FOR EACH ROW
    BEGIN
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${FROZEN_MESSAGE}';
    END`);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS reports_frozen_delete');
  await qi.sequelize.query('DROP TRIGGER IF EXISTS reports_frozen_update');
  await qi.dropTable('reports');
  await qi.dropTable('report_counters');
}
