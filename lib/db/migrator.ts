import { readdirSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug, type MigrationFn } from "umzug";

const MIGRATIONS_DIR = join(process.cwd(), "migrations");

const migrationFiles = (dir: string) =>
  readdirSync(dir)
    .filter((f) => /^\d{3}-[a-z0-9-]+\.ts$/.test(f))
    .sort();

/** The migrations this code knows, by the names SequelizeMeta records. */
export const migrationNames = (dir = MIGRATIONS_DIR) => migrationFiles(dir).map((f) => f.replace(/\.ts$/, ""));

type MigrationModule = { up: MigrationFn<QueryInterface>; down: MigrationFn<QueryInterface> };

/** Numbered umzug migrations from migrations/, recorded in the SequelizeMeta table. */
export function createMigrator(sequelize: Sequelize, dir = MIGRATIONS_DIR) {
  return new Umzug<QueryInterface>({
    migrations: migrationFiles(dir).map((file) => {
      const load = () => import(pathToFileURL(join(dir, file)).href) as Promise<MigrationModule>;
      return {
        name: file.replace(/\.ts$/, ""),
        up: async (params) => (await load()).up(params),
        down: async (params) => (await load()).down(params),
      };
    }),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}
