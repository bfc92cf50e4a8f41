// Migrate (and seed an empty database). Used by `npm start`, the browser-test harness and CI.
import { prepareDatabase } from "./prepare-db";

prepareDatabase({ seed: !process.argv.includes("--no-seed") }).catch((err) => {
  console.error(err);
  process.exit(1);
});
