import { DataTypes, type QueryInterface } from 'sequelize';

// A requirement set belongs to a product line; its revisions are numbered
// 1, 2, ... within the set. Requirements and the approval's impact record are
// stored as JSON text exactly as approved, so the stored sha256 can be
// recomputed from the row.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('requirement_sets', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    product_line_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'product_lines', key: 'id' } },
    name: { type: DataTypes.STRING(120), allowNull: false },
    purpose: { type: DataTypes.TEXT, allowNull: false },
    created_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('requirement_sets', ['product_line_id', 'name'], { unique: true, name: 'requirement_sets_line_name' });

  await qi.createTable('revisions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    requirement_set_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'requirement_sets', key: 'id' } },
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    status: { type: DataTypes.ENUM('draft', 'in_review', 'approved', 'retired'), allowNull: false },
    requirements_json: { type: DataTypes.TEXT, allowNull: false },
    rationale: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    author_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    approver_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' } },
    submitted_at: { type: DataTypes.DATE(3), allowNull: true },
    approved_at: { type: DataTypes.DATE(3), allowNull: true },
    retired_at: { type: DataTypes.DATE(3), allowNull: true },
    sha256: { type: DataTypes.CHAR(64), allowNull: true },
    approval_meaning: { type: DataTypes.STRING(32), allowNull: true },
    impact_json: { type: DataTypes.TEXT('long'), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('revisions', ['requirement_set_id', 'number'], { unique: true, name: 'revisions_set_number' });
  await qi.addIndex('revisions', ['requirement_set_id', 'status'], { name: 'revisions_set_status' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('revisions');
  await qi.dropTable('requirement_sets');
}
