import type { TableColumnOptions } from 'typeorm';

// Column helpers for migrations written with TypeORM's Table API, which runs on SQLite and PostgreSQL alike.
export const idColumn: TableColumnOptions = { name: 'id', type: 'integer', isPrimary: true, isGenerated: true, generationStrategy: 'increment' };
export const instantColumn = (name: string, isNullable = false): TableColumnOptions => ({ name, type: 'varchar', length: '30', isNullable });
export const textColumn = (name: string, length: number, isNullable = false): TableColumnOptions => ({ name, type: 'varchar', length: String(length), isNullable });
export const realColumn = (name: string, isNullable = false): TableColumnOptions => ({ name, type: 'double precision', isNullable });
export const intColumn = (name: string, isNullable = false): TableColumnOptions => ({ name, type: 'integer', isNullable });
