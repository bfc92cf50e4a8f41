import { describe, expect, it } from "vitest";
import { setupTestDb } from "../helpers/db";

// Sequelize names an association after the target's class when no `as` is given. The production bundle minifies
// class names, so an unnamed association got a one-letter (or empty) alias there: an empty one made a has-one's
// getter replace Model#get and every plan write answered 500 under `next start` only.
const d = await setupTestDb();

describe("model associations", () => {
  it("every association names its alias", () => {
    const unnamed = Object.entries(d)
      .filter(([name]) => name !== "sequelize" && name !== "storage")
      .flatMap(([name, model]) =>
        Object.values(
          (model as { associations?: Record<string, { isAliased: boolean; as: string }> }).associations ?? {},
        )
          .filter((a) => !a.isAliased)
          .map((a) => `${name} → ${a.as}`),
      );
    expect(unnamed).toEqual([]);
  });
});
