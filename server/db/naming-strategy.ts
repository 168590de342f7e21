import { DefaultNamingStrategy, type NamingStrategyInterface } from 'typeorm';

// vocGPerL → voc_g_per_l: split before a capital that starts a word, and between lower and upper.
const toSnake = (name: string) =>
  name
    .replace(/([A-Z])([A-Z][a-z])/g, '$1_$2')
    .replace(/([a-z0-9])([A-Z])/g, '$1_$2')
    .toLowerCase();

/** snake_case columns, so hand-written report SQL reads the same on SQLite and PostgreSQL. */
export class SnakeNamingStrategy extends DefaultNamingStrategy implements NamingStrategyInterface {
  columnName(propertyName: string, customName: string | undefined, embeddedPrefixes: string[]): string {
    return customName ?? toSnake([...embeddedPrefixes, propertyName].join('_'));
  }

  joinColumnName(relationName: string, referencedColumnName: string): string {
    return toSnake(`${relationName}_${referencedColumnName}`);
  }
}
