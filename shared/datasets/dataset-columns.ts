import { z } from 'zod';
import { storableText } from '../storable/storable-text';

/** What a column of a brought dataset stands for in a demand model. */
export const columnRoles = [
  'price',
  'quantity',
  'other-price',
  'income',
  'grouping',
  'weight',
  'instrument',
  'date',
  'covariate',
  'ignore',
] as const;
export type ColumnRole = (typeof columnRoles)[number];

/** How a stored column is typed in the dataset's table. */
export const columnTypes = ['number', 'text', 'date'] as const;
export type ColumnType = (typeof columnTypes)[number];

/** Roles a dataset may hold at most once; price and quantity it must hold. */
export const singleRoles: readonly ColumnRole[] = ['price', 'quantity', 'weight'];
export const requiredRoles: readonly ColumnRole[] = ['price', 'quantity'];

/** The type a role implies (a grouping is a label, a date a calendar day, the rest numbers). */
export function typeOfRole(role: ColumnRole): ColumnType {
  if (role === 'grouping') return 'text';
  if (role === 'date') return 'date';
  return 'number';
}

/** Lower-case letters, digits and underscores, starting with a letter: safe as a column name. */
export const storedNameSchema = z
  .string()
  .regex(
    /^[a-z][a-z0-9_]{0,39}$/,
    'Use 1–40 lower-case letters, digits or underscores, starting with a letter',
  )
  .refine((name) => name !== 'line', { error: '"line" is kept for the file line number' });

/** One column of the file and what it becomes. */
export const columnMappingSchema = z.strictObject({
  /** The header as it stands in the file. */
  source: storableText().min(1, 'Name the file column').max(200),
  name: storedNameSchema,
  role: z.enum(columnRoles, { error: 'Choose a role' }),
  type: z.enum(columnTypes, { error: 'Choose number, text or date' }),
});
export type ColumnMapping = z.infer<typeof columnMappingSchema>;

/** A whole mapping: each file column at most once, each stored name once, price and quantity. */
export const columnMappingListSchema = z
  .array(columnMappingSchema)
  .min(1, 'Map at least the price and quantity columns')
  .max(100, 'At most 100 columns')
  .superRefine((columns, ctx) => {
    const seen = new Map<string, number>();
    const names = new Map<string, number>();
    columns.forEach((column, i) => {
      if (seen.has(column.source)) {
        ctx.addIssue({
          code: 'custom',
          path: [i, 'source'],
          message: `File column "${column.source}" is mapped twice (also as column ${seen.get(column.source)! + 1})`,
        });
      }
      seen.set(column.source, i);
      if (column.role === 'ignore') return;
      if (names.has(column.name)) {
        ctx.addIssue({
          code: 'custom',
          path: [i, 'name'],
          message: `The name ${column.name} is used twice`,
        });
      }
      names.set(column.name, i);
      if (column.type !== typeOfRole(column.role) && column.role !== 'covariate') {
        ctx.addIssue({
          code: 'custom',
          path: [i, 'type'],
          message: `A ${column.role} column holds ${typeOfRole(column.role)} values`,
        });
      }
    });
    for (const role of singleRoles) {
      const count = columns.filter((c) => c.role === role).length;
      if (count > 1) {
        const at = columns.map((c) => c.role).lastIndexOf(role);
        ctx.addIssue({ code: 'custom', path: [at, 'role'], message: `Only one ${role} column` });
      }
    }
    for (const role of requiredRoles) {
      if (!columns.some((c) => c.role === role)) {
        ctx.addIssue({ code: 'custom', path: [], message: `Map a ${role} column` });
      }
    }
  });
