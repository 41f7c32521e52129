import type { QueryInterface } from 'sequelize';

/** One migration: a single change with its exact inverse. */
export interface Migration {
  name: string;
  up: (context: { context: QueryInterface }) => Promise<void>;
  down: (context: { context: QueryInterface }) => Promise<void>;
}

