import type { Connection } from 'mariadb';
import { DataTypes, UniqueConstraintError, type Attributes, type Model, type ModelStatic, type Sequelize, type Transaction } from 'sequelize';

/**
 * Model rows read and written with plain parameterised SQL on one connection, for the tablet's
 * write path. A Sequelize finder or save costs 0.2–0.3 ms of CPU (option cloning, query
 * building, hooks, instance building); a step completion used about twenty of them and the
 * server spent ~6 ms of CPU a request (`npm run bench -- --only=writes`). The models stay the
 * one description of each table: column lists and types come from their attributes, and rows
 * come back as model instances, so the code around them does not change.
 *
 * Hooks, validations and scopes do not run here: use it only for models that have none.
 */

type Scalar = string | number | boolean | Date | null;
export type RowWhere<M extends Model> = { [K in keyof Attributes<M>]?: Scalar };

interface Column {
  name: string;
  field: string;
  kind: 'json' | 'boolean' | 'plain';
}

interface Shape {
  table: string;
  columns: Column[];
  byName: Map<string, Column>;
  primaryKey: Column;
  timestamps: boolean;
  selectList: string;
}

const shapes = new WeakMap<object, Shape>();

function shapeOf(model: ModelStatic<Model>): Shape {
  const known = shapes.get(model);
  if (known) return known;
  const attributes = model.getAttributes() as Record<string, { field?: string; type: unknown }>;
  const columns = Object.entries(attributes).map(([name, a]): Column => {
    const kind = a.type instanceof DataTypes.JSON ? 'json' : a.type instanceof DataTypes.BOOLEAN ? 'boolean' : 'plain';
    return { name, field: a.field ?? name, kind };
  });
  const byName = new Map(columns.map((c) => [c.name, c]));
  const primaryKey = byName.get(model.primaryKeyAttribute);
  if (!primaryKey) throw new Error(`${model.name} has no primary key attribute.`);
  const table = model.getTableName();
  const shape: Shape = {
    table: typeof table === 'string' ? table : table.tableName,
    columns,
    byName,
    primaryKey,
    timestamps: model.options.timestamps !== false,
    selectList: columns.map((c) => `\`${c.field}\``).join(', '),
  };
  shapes.set(model, shape);
  return shape;
}

function column(shape: Shape, name: string): Column {
  const found = shape.byName.get(name);
  if (!found) throw new Error(`Table ${shape.table} has no attribute “${name}”.`);
  return found;
}

/** A value as the driver should send it: JSON columns as text, the rest as they are. */
const toSql = (c: Column, value: unknown): unknown => (c.kind === 'json' && value !== null && value !== undefined ? JSON.stringify(value) : value);

/** A value as Sequelize would hand it over: JSON parsed, booleans as booleans. */
function fromSql(c: Column, value: unknown): unknown {
  if (value === null || value === undefined) return null;
  if (c.kind === 'json') return typeof value === 'string' ? JSON.parse(value) : value;
  if (c.kind === 'boolean') return Boolean(Number(value));
  return value;
}

/** The mariadb connection a Sequelize transaction holds (set by Sequelize when the transaction begins). */
export function connectionOf(transaction: Transaction): Connection {
  const { connection } = transaction as unknown as { connection?: Connection };
  if (!connection) throw new Error('The transaction has no connection yet.');
  return connection;
}

/** Runs `work` on a pooled connection outside any transaction (autocommit), and gives it back. */
export async function withConnection<T>(sequelize: Sequelize, work: (connection: Connection) => Promise<T>): Promise<T> {
  const manager = sequelize.connectionManager;
  const connection = (await manager.getConnection({ type: 'write' })) as unknown as Connection;
  try {
    return await work(connection);
  } finally {
    manager.releaseConnection(connection as never);
  }
}

function whereClause(shape: Shape, where: Record<string, unknown>): { sql: string; params: unknown[] } {
  const parts: string[] = [];
  const params: unknown[] = [];
  for (const [name, value] of Object.entries(where)) {
    if (value === undefined) continue;
    const c = column(shape, name);
    if (value === null) parts.push(`\`${c.field}\` IS NULL`);
    else {
      parts.push(`\`${c.field}\` = ?`);
      params.push(toSql(c, value));
    }
  }
  if (parts.length === 0) throw new Error(`A direct read of ${shape.table} needs a condition.`);
  return { sql: parts.join(' AND '), params };
}

type FindOptions<M extends Model> = { lock?: boolean; orderBy?: keyof Attributes<M> & string };

/**
 * The rows matching `where` (equality, null as IS NULL) as plain values: for rows only read, where
 * building instances would cost more than the query (~30 µs each). `lock` reads FOR UPDATE.
 */
export async function findPlainRows<M extends Model>(model: ModelStatic<M>, connection: Connection, where: RowWhere<M>, options: FindOptions<M> = {}): Promise<Array<Attributes<M>>> {
  const shape = shapeOf(model as ModelStatic<Model>);
  const condition = whereClause(shape, where as Record<string, unknown>);
  const order = options.orderBy ? ` ORDER BY \`${column(shape, options.orderBy).field}\`` : '';
  const sql = `SELECT ${shape.selectList} FROM \`${shape.table}\` WHERE ${condition.sql}${order}${options.lock ? ' FOR UPDATE' : ''}`;
  // Plain query(sql, values): passing per-query options makes the connector copy all its options each time.
  const rows = (await connection.query(sql, condition.params)) as Array<Record<string, unknown>>;
  return rows.map((row) => {
    const values: Record<string, unknown> = {};
    for (const c of shape.columns) values[c.name] = fromSql(c, row[c.field]);
    return values as Attributes<M>;
  });
}

/** The same rows as model instances, for rows the caller goes on to change. */
export async function findRows<M extends Model>(model: ModelStatic<M>, connection: Connection, where: RowWhere<M>, options: FindOptions<M> = {}): Promise<M[]> {
  return (await findPlainRows(model, connection, where, options)).map((values) => model.build(values as never, { isNewRecord: false, raw: true }));
}

/** The first matching row, or null. */
export async function findRow<M extends Model>(model: ModelStatic<M>, connection: Connection, where: RowWhere<M>, options: { lock?: boolean } = {}): Promise<M | null> {
  return (await findRows(model, connection, where, options))[0] ?? null;
}

/** A duplicate key is the same UniqueConstraintError Sequelize throws, so callers and the error handler treat both alike. */
export async function writing<T>(query: Promise<T>): Promise<T> {
  try {
    return await query;
  } catch (err) {
    const { errno, text } = err as { errno?: number; text?: string };
    if (errno === 1062) throw new UniqueConstraintError({ message: text ?? 'Duplicate entry', parent: err as Error & { sql: string } });
    throw err;
  }
}

/** Inserts one row (timestamps filled as Sequelize would) and returns its new primary key. */
export async function insertRow<M extends Model>(model: ModelStatic<M>, connection: Connection, values: Partial<Attributes<M>>): Promise<number> {
  const shape = shapeOf(model as ModelStatic<Model>);
  const row: Record<string, unknown> = { ...values };
  if (shape.timestamps) {
    const now = new Date();
    for (const name of ['createdAt', 'updatedAt']) if (shape.byName.has(name) && row[name] === undefined) row[name] = now;
  }
  const names = Object.keys(row).filter((n) => row[n] !== undefined);
  const cols = names.map((n) => column(shape, n));
  const sql = `INSERT INTO \`${shape.table}\` (${cols.map((c) => `\`${c.field}\``).join(', ')}) VALUES (${cols.map(() => '?').join(', ')})`;
  const result = (await writing(connection.query(sql, cols.map((c) => toSql(c, row[c.name]))))) as { insertId: number | bigint };
  return Number(result.insertId);
}

/**
 * Writes `changes` to the row of `instance` (updatedAt too, as Sequelize would). They are applied
 * to the instance at once, so a caller that defers the write (sends it, awaits it later) goes on
 * with what will be saved; if the write fails, its transaction rolls back and the instance is dropped.
 */
export async function updateRow<M extends Model>(instance: M, connection: Connection, changes: Partial<Attributes<M>>): Promise<M> {
  const model = instance.constructor as ModelStatic<Model>;
  const shape = shapeOf(model);
  const row: Record<string, unknown> = { ...changes };
  if (shape.timestamps && shape.byName.has('updatedAt') && row.updatedAt === undefined) row.updatedAt = new Date();
  const names = Object.keys(row).filter((n) => row[n] !== undefined);
  if (names.length === 0) return instance;
  const cols = names.map((n) => column(shape, n));
  const sql = `UPDATE \`${shape.table}\` SET ${cols.map((c) => `\`${c.field}\` = ?`).join(', ')} WHERE \`${shape.primaryKey.field}\` = ?`;
  const saved = writing(connection.query(sql, [...cols.map((c) => toSql(c, row[c.name])), instance.get(shape.primaryKey.name)]));
  for (const name of names) instance.setDataValue(name as never, row[name] as never);
  await saved;
  return instance;
}

/** The Sequelize a model was initialised with. */
export function sequelizeOf(model: ModelStatic<Model>): Sequelize {
  if (!model.sequelize) throw new Error(`${model.name} was never initialised.`);
  return model.sequelize;
}
