import type { Sequelize, Transaction } from 'sequelize';

let current: Sequelize | null = null;

export function setSequelize(s: Sequelize): void {
  current = s;
}

export function getSequelize(): Sequelize {
  if (!current) throw new Error('Sequelize has not been set up');
  return current;
}

/** Runs a unit of work in one transaction: all of it lands or none of it. */
export function inTransaction<T>(work: (t: Transaction) => Promise<T>): Promise<T> {
  return getSequelize().transaction(work);
}
