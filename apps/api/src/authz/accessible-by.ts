import { rulesToAST } from '@casl/ability/extra';
import { and, eq, inArray, ne, not, notInArray, or, type SQL, sql } from 'drizzle-orm';
import type { PgColumn } from 'drizzle-orm/pg-core';
import type { Action, AppAbility, SubjectName } from './ability.js';

type Condition = { operator: string; field?: string; value: unknown };

/** A condition field that is not a plain column, e.g. "this staff member has a line on the ticket". */
export type FieldTranslator = (operator: string, value: unknown) => SQL;
export type FieldMap = Record<string, PgColumn | FieldTranslator>;

/**
 * Turns the CASL rules for `action` on `subjectName` into a SQL condition over the given columns,
 * so lists are filtered by the database with the very rules that guard single records.
 */
export function accessibleBy(ability: AppAbility, action: Action, subjectName: SubjectName, columns: FieldMap): SQL {
  const ast = rulesToAST(ability, action, subjectName) as Condition | null;
  if (!ast) return sql`false`;
  return toSql(ast, columns, subjectName);
}

function toSql(condition: Condition, columns: FieldMap, subjectName: string): SQL {
  const children = () => (condition.value as Condition[]).map((child) => toSql(child, columns, subjectName));
  switch (condition.operator) {
    case 'and':
      return (condition.value as Condition[]).length === 0 ? sql`true` : and(...children())!;
    case 'or':
      return (condition.value as Condition[]).length === 0 ? sql`false` : or(...children())!;
    case 'not':
      return not(toSql(condition.value as Condition, columns, subjectName));
  }
  const column = condition.field ? columns[condition.field] : undefined;
  if (!column) throw new Error(`No column for ${subjectName}.${condition.field ?? '?'} in a CASL condition`);
  if (typeof column === 'function') return column(condition.operator, condition.value);
  switch (condition.operator) {
    case 'eq':
      return eq(column, condition.value);
    case 'ne':
      return ne(column, condition.value);
    case 'in':
      return (condition.value as unknown[]).length === 0 ? sql`false` : inArray(column, condition.value as unknown[]);
    case 'nin':
      return (condition.value as unknown[]).length === 0 ? sql`true` : notInArray(column, condition.value as unknown[]);
    default:
      throw new Error(`CASL operator ${condition.operator} has no SQL translation yet`);
  }
}
