import { DataTypes, type QueryInterface } from 'sequelize';

// Candidates keep the design exactly as submitted (JSON text). An assessment
// pins the revision it was made against by id and by content hash, with the
// engine version, so it can be reproduced; it is never moved to a newer one.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('candidates', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    product_line_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'product_lines', key: 'id' } },
    name: { type: DataTypes.STRING(120), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    design_json: { type: DataTypes.TEXT, allowNull: false },
    created_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('candidates', ['product_line_id', 'id'], { name: 'candidates_line' });

  await qi.createTable('assessments', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    candidate_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'candidates', key: 'id' } },
    revision_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'revisions', key: 'id' } },
    revision_sha256: { type: DataTypes.CHAR(64), allowNull: false },
    engine_version: { type: DataTypes.STRING(32), allowNull: false },
    verdict: { type: DataTypes.STRING(16), allowNull: false },
    result_json: { type: DataTypes.TEXT('long'), allowNull: false },
    created_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('assessments', ['candidate_id', 'revision_id', 'id'], { name: 'assessments_candidate_revision' });
  await qi.addIndex('assessments', ['revision_id'], { name: 'assessments_revision' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('assessments');
  await qi.dropTable('candidates');
}
