// Sequelize keeps these at run time but leaves them out of its types; integration tests read them to count
// queries and to check that no SQLite connection is left open.
import type { Options } from "sequelize";

declare module "sequelize/types/sequelize" {
  interface Sequelize {
    /** The options the instance was made with; `logging` may be swapped for a while to count queries. */
    readonly options: Options;
  }
}

declare module "sequelize/types/dialects/abstract/connection-manager" {
  interface ConnectionManager {
    /** SQLite only: the open connections by name ("default", or a transaction's id). */
    readonly connections: Record<string, unknown>;
  }
}
