import type { QueryInterface } from 'sequelize';

// An approved or retired revision is frozen in the database itself, not only
// in the API: a direct UPDATE or DELETE is refused with SQLSTATE 45000. The
// one move allowed is approved -> retired (setting retired_at); updated_at is
// bookkeeping and may change. The API maps the signal to 409 revision_frozen.
const FROZEN_MESSAGE = 'revision_frozen: an approved or retired revision cannot be changed';

// Columns compared null-safely (<=>) so a NULL turning into a value counts.
const CONTENT_COLUMNS = [
  'id',
  'requirement_set_id',
  'number',
  'requirements_json',
  'rationale',
  'version',
  'author_id',
  'approver_id',
  'submitted_at',
  'approved_at',
  'sha256',
  'approval_meaning',
  'impact_json',
  'created_at',
];

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  const changed = CONTENT_COLUMNS.map((c) => `NOT (NEW.${c} <=> OLD.${c})`).join(' OR ');
  await qi.sequelize.query(`
    CREATE TRIGGER revisions_frozen_update BEFORE UPDATE ON revisions FOR EACH ROW
    BEGIN
      IF OLD.status IN ('approved', 'retired') THEN
        IF NOT (NEW.status = OLD.status OR (OLD.status = 'approved' AND NEW.status = 'retired')) THEN
          SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${FROZEN_MESSAGE}';
        END IF;
        IF ${changed} THEN
          SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${FROZEN_MESSAGE}';
        END IF;
        IF OLD.status = 'retired' AND NOT (NEW.retired_at <=> OLD.retired_at) THEN
          SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${FROZEN_MESSAGE}';
        END IF;
      END IF;
    END`);
  await qi.sequelize.query(`
    CREATE TRIGGER revisions_frozen_delete BEFORE DELETE ON revisions FOR EACH ROW
    BEGIN
      IF OLD.status IN ('approved', 'retired') THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${FROZEN_MESSAGE}';
      END IF;
    END`);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS revisions_frozen_delete');
  await qi.sequelize.query('DROP TRIGGER IF EXISTS revisions_frozen_update');
}
