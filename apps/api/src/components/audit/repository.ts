import { Op, QueryTypes, type Transaction, type WhereOptions } from 'sequelize';

import { bindRows } from '../../lib/bind-rows.js';
import { canonicalJson } from '../../lib/canonical-json.js';
import { getSequelize } from '../../lib/transaction.js';
import { chainHash, chainedFieldsOf, type ChainedFields } from './chain-hash.js';
import { AuditEventModel, AuditHeadModel } from './model.js';

export interface AuditEventInput {
  actor: { id: number; email: string } | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  productLineId?: number | null;
  before?: unknown;
  after?: unknown;
}

export interface AuditEventRecord {
  id: number;
  occurredAt: string;
  actorId: number | null;
  actorEmail: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  productLineId: number | null;
  before: unknown;
  after: unknown;
  prevHash: string;
  hash: string;
}

export interface AuditFilter {
  productLineId?: number | undefined;
  actorId?: number | undefined;
  action?: string | undefined;
  entityType?: string | undefined;
  entityId?: string | undefined;
  from?: Date | undefined;
  to?: Date | undefined;
}

/** An event as stored: before and after kept as the exact canonical JSON that was hashed. */
export interface StoredAuditEvent extends ChainedFields {
  id: number;
  hash: string;
}

export interface AuditFacetIds {
  actions: string[];
  entityTypes: string[];
  actors: { id: number; email: string }[];
  productLineIds: number[];
}

function toRecord(row: AuditEventModel): AuditEventRecord {
  const e = row.get({ plain: true });
  return {
    id: Number(e.id),
    occurredAt: new Date(e.occurredAt).toISOString(),
    actorId: e.actorId,
    actorEmail: e.actorEmail,
    action: e.action,
    entityType: e.entityType,
    entityId: e.entityId,
    productLineId: e.productLineId,
    before: e.beforeJson === null ? null : JSON.parse(e.beforeJson),
    after: e.afterJson === null ? null : JSON.parse(e.afterJson),
    prevHash: e.prevHash,
    hash: e.hash,
  };
}

function whereOf(f: AuditFilter): WhereOptions {
  const where: Record<string | symbol, unknown> = {};
  if (f.productLineId !== undefined) where.productLineId = f.productLineId;
  if (f.actorId !== undefined) where.actorId = f.actorId;
  if (f.action !== undefined) where.action = f.action;
  if (f.entityType !== undefined) where.entityType = f.entityType;
  if (f.entityId !== undefined) where.entityId = f.entityId;
  if (f.from || f.to) {
    where.occurredAt = { ...(f.from ? { [Op.gte]: f.from } : {}), ...(f.to ? { [Op.lte]: f.to } : {}) };
  }
  return where as WhereOptions;
}

const INSERT_CHUNK = 200;

export const auditRepository = {
  /**
   * Appends events, in order, to the chain inside the caller's transaction, so
   * they land if and only if the writes they describe land. The head row is
   * locked FOR UPDATE, once for all of them: concurrent writers are put in
   * line, never forked, and a batch of writes that commit together (see
   * lib/group-commit.ts) queues once. Plain queries, since every write of the
   * app passes here while holding the lock: the less work between lock and
   * commit, the shorter the line.
   */
  async appendMany(inputs: AuditEventInput[], transaction: Transaction): Promise<AuditEventRecord[]> {
    if (inputs.length === 0) return [];
    const sequelize = getSequelize();
    const [head] = await sequelize.query<{ last_hash: string }>('SELECT last_hash FROM audit_head WHERE id = 1 FOR UPDATE', { type: QueryTypes.SELECT, transaction });
    if (!head) throw new Error('audit_head row is missing; run the migrations');
    // Hashes first (each link needs the one before), then one insert for all of them.
    let prevHash = head.last_hash;
    const links = inputs.map((input) => {
      const occurredAt = new Date();
      const fields = {
        occurredAt: occurredAt.toISOString(),
        actorId: input.actor?.id ?? null,
        actorEmail: input.actor?.email ?? null,
        action: input.action,
        entityType: input.entityType,
        entityId: input.entityId === undefined || input.entityId === null ? null : String(input.entityId),
        productLineId: input.productLineId ?? null,
        beforeJson: input.before === undefined || input.before === null ? null : canonicalJson(input.before),
        afterJson: input.after === undefined || input.after === null ? null : canonicalJson(input.after),
      };
      const link = { input, occurredAt, fields, prevHash, hash: chainHash(prevHash, fields) };
      prevHash = link.hash;
      return link;
    });
    // Statements of at most INSERT_CHUNK rows keep a large batch (an upload) well under the server's packet limit.
    const inserted: { id: number }[] = [];
    for (let from = 0; from < links.length; from += INSERT_CHUNK) {
      const chunk = links.slice(from, from + INSERT_CHUNK);
      const rows = await sequelize.query<{ id: number }>(
        `INSERT INTO audit_events (occurred_at, actor_id, actor_email, action, entity_type, entity_id, product_line_id, before_json, after_json, prev_hash, hash)
         VALUES ${bindRows(chunk.length, 11)} RETURNING id`,
        {
          bind: chunk.flatMap(({ occurredAt, fields: f, prevHash: prev, hash }) => [occurredAt, f.actorId, f.actorEmail, f.action, f.entityType, f.entityId, f.productLineId, f.beforeJson, f.afterJson, prev, hash]),
          type: QueryTypes.SELECT,
          transaction,
        },
      );
      inserted.push(...rows);
    }
    if (inserted.length !== links.length) throw new Error(`inserted ${inserted.length} audit events of ${links.length}`);
    const out: AuditEventRecord[] = links.map(({ input, fields, prevHash: prev, hash }, i) => ({
      id: Number(inserted[i]!.id),
      occurredAt: fields.occurredAt,
      actorId: fields.actorId,
      actorEmail: fields.actorEmail,
      action: fields.action,
      entityType: fields.entityType,
      entityId: fields.entityId,
      productLineId: fields.productLineId,
      before: input.before ?? null,
      after: input.after ?? null,
      prevHash: prev,
      hash,
    }));
    const lastId = out[out.length - 1]!.id;
    await sequelize.query('UPDATE audit_head SET last_id = ?, last_hash = ? WHERE id = 1', { replacements: [lastId, prevHash], type: QueryTypes.UPDATE, transaction });
    return out;
  },

  async list(filter: AuditFilter, limit: number, offset: number): Promise<{ items: AuditEventRecord[]; total: number }> {
    const { rows, count } = await AuditEventModel.findAndCountAll({
      where: whereOf(filter),
      order: [['id', 'DESC']],
      limit,
      offset,
    });
    return { items: rows.map(toRecord), total: count };
  },

  /**
   * The filtered events, newest first, in batches read by keyset (id below the
   * last one seen) rather than by offset, so an export of many events never
   * re-reads or skips rows. Events appended meanwhile have higher ids and are
   * left out: the export is the trail as it stood when it began.
   */
  async *scan(filter: AuditFilter, batchSize = 500): AsyncGenerator<StoredAuditEvent[]> {
    const base = whereOf(filter) as Record<string | symbol, unknown>;
    let below: number | null = null;
    for (;;) {
      const rows: AuditEventModel[] = await AuditEventModel.findAll({
        where: (below === null ? base : { ...base, id: { [Op.lt]: below } }) as WhereOptions,
        order: [['id', 'DESC']],
        limit: batchSize,
        raw: true,
      });
      if (rows.length === 0) return;
      yield rows.map((e) => ({ id: Number(e.id), ...chainedFieldsOf(e), hash: e.hash }));
      if (rows.length < batchSize) return;
      below = Number(rows[rows.length - 1]!.id);
    }
  },

  /** The distinct values the trail holds, for filter choices (each column is indexed, so these stay cheap). */
  async facets(): Promise<AuditFacetIds> {
    const sequelize = getSequelize();
    const [actions, entityTypes, actors, lines] = await Promise.all([
      sequelize.query<{ v: string }>('SELECT DISTINCT action AS v FROM audit_events ORDER BY v', { type: QueryTypes.SELECT }),
      sequelize.query<{ v: string }>('SELECT DISTINCT entity_type AS v FROM audit_events ORDER BY v', { type: QueryTypes.SELECT }),
      sequelize.query<{ id: number; email: string | null }>(
        'SELECT actor_id AS id, MAX(actor_email) AS email FROM audit_events WHERE actor_id IS NOT NULL GROUP BY actor_id',
        { type: QueryTypes.SELECT },
      ),
      sequelize.query<{ id: number }>('SELECT DISTINCT product_line_id AS id FROM audit_events WHERE product_line_id IS NOT NULL', {
        type: QueryTypes.SELECT,
      }),
    ]);
    return {
      actions: actions.map((r) => r.v),
      entityTypes: entityTypes.map((r) => r.v),
      actors: actors.map((r) => ({ id: Number(r.id), email: r.email ?? '' })),
      productLineIds: lines.map((r) => Number(r.id)),
    };
  },

  /** Current names of the given product lines, for display beside the ids the trail keeps. */
  async productLineNames(ids: number[]): Promise<Map<number, string>> {
    const wanted = [...new Set(ids)];
    if (wanted.length === 0) return new Map();
    const rows = await getSequelize().query<{ id: number; name: string }>('SELECT id, name FROM product_lines WHERE id IN (:ids)', {
      replacements: { ids: wanted },
      type: QueryTypes.SELECT,
    });
    return new Map(rows.map((r) => [Number(r.id), r.name]));
  },

  async head(): Promise<{ lastId: number | null; lastHash: string }> {
    const head = await AuditHeadModel.findByPk(1, { raw: true });
    return { lastId: head?.lastId === null || head?.lastId === undefined ? null : Number(head.lastId), lastHash: head?.lastHash ?? '' };
  },

  /** Walks the chain in id order in pages; reports the first event whose link or hash does not match. */
  async verify(): Promise<{ intact: boolean; checked: number; firstBreak: { id: number; reason: string } | null }> {
    let prev = '0'.repeat(64);
    let checked = 0;
    let lastId = 0;
    for (;;) {
      const rows = await AuditEventModel.findAll({ where: { id: { [Op.gt]: lastId } }, order: [['id', 'ASC']], limit: 1000, raw: true });
      if (rows.length === 0) break;
      for (const e of rows) {
        checked += 1;
        if (e.prevHash !== prev) {
          return { intact: false, checked, firstBreak: { id: Number(e.id), reason: 'its link to the event before it does not match' } };
        }
        if (chainHash(prev, chainedFieldsOf(e)) !== e.hash) {
          return { intact: false, checked, firstBreak: { id: Number(e.id), reason: 'its content does not match its hash' } };
        }
        prev = e.hash;
        lastId = Number(e.id);
      }
    }
    const head = await this.head();
    if (head.lastHash !== prev) {
      return { intact: false, checked, firstBreak: { id: lastId, reason: 'the chain head does not match the last event' } };
    }
    return { intact: true, checked, firstBreak: null };
  },
};
