import type { QueryInterface } from 'sequelize';

// The audit-trail page filters by action and lists the distinct actions for its
// select; without an index both read the whole trail.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addIndex('audit_events', ['action'], { name: 'audit_events_action' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('audit_events', 'audit_events_action');
}
