import { QueryTypes, type CreationAttributes, type Model, type ModelStatic, type Transaction } from "sequelize";

// Many rows in one INSERT with bound values, for writes that add hundreds of rows at once (a generated season
// progression). Model.create builds an instance and runs one statement per row; bulkCreate on SQLite writes
// the values into the SQL text, where a NUL would end the statement. Here every value is a bind parameter,
// converted by the dialect's own data types (dates, JSON) exactly as create() converts it.

/** The query generator's value formatter (public in Sequelize's source, left out of its type declarations). */
type Formatter = {
  format(value: unknown, field: unknown, options: object, bindParam: (value: unknown) => string): string;
  quoteTable(table: string): string;
  quoteIdentifier(identifier: string): string;
};

/**
 * Bound parameters per statement. Sequelize hands SQLite its parameters by name ($1, $2, …), and SQLite finds
 * each name by a scan of the statement's names, so a statement's bind cost grows with the square of its count:
 * 4,000 rows of 8 columns took 3.7 s to insert in statements of 8,000 parameters and 0.12 s in statements of 500.
 */
const MAX_PARAMETERS = 500;

/**
 * Inserts `rows` into the model's table and returns their new ids in the order of `rows`. Columns a row leaves
 * out get the model's default (timestamps: now). Ids come back through RETURNING; as neither SQLite nor
 * PostgreSQL promises RETURNING's row order, they are sorted: both hand out a statement's new keys in the order
 * its VALUES rows are inserted.
 */
export async function insertRowsReturningIds<M extends Model>(
  model: ModelStatic<M>,
  rows: readonly CreationAttributes<M>[],
  transaction: Transaction,
): Promise<number[]> {
  if (rows.length === 0) return [];
  const sequelize = model.sequelize!;
  const qg = sequelize.getQueryInterface().queryGenerator as Formatter;
  const now = new Date();
  const attributes = Object.entries(model.getAttributes()).filter(([, a]) => !a.autoIncrement);
  const columns = attributes.map(([name, a]) => ({ name, attribute: a, field: a.field ?? name }));
  const valueOf = (row: Record<string, unknown>, name: string, defaultValue: unknown) => {
    const v = row[name];
    if (v !== undefined) return v;
    if (name === "createdAt" || name === "updatedAt") return now;
    return typeof defaultValue === "function" ? null : (defaultValue ?? null);
  };
  const perStatement = Math.max(1, Math.floor(MAX_PARAMETERS / columns.length));
  const table = qg.quoteTable(model.getTableName() as string);
  const fields = columns.map((c) => qg.quoteIdentifier(c.field)).join(", ");
  const ids: number[] = [];
  for (let i = 0; i < rows.length; i += perStatement) {
    const bind: unknown[] = [];
    const bindParam = (value: unknown) => {
      bind.push(value);
      return `$${bind.length}`;
    };
    const tuples = rows.slice(i, i + perStatement).map((row) => {
      const values = columns.map((c) =>
        qg.format(valueOf(row, c.name, c.attribute.defaultValue), c.attribute, { operation: "insert" }, bindParam),
      );
      return `(${values.join(", ")})`;
    });
    // The leading comment keeps Sequelize's SQLite query from taking this for a plain INSERT (which it runs
    // without reading rows back), so RETURNING's rows reach us.
    const sql = `/* bound rows */ INSERT INTO ${table} (${fields}) VALUES ${tuples.join(", ")} RETURNING "id"`;
    const returned = await sequelize.query<{ id: number }>(sql, { bind, type: QueryTypes.SELECT, transaction });
    ids.push(...returned.map((r) => Number(r.id)).sort((a, b) => a - b));
  }
  return ids;
}
