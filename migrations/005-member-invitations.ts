import { DataTypes, QueryTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// An invitation to join a team is no longer a membership: the membership is created only when the invitee
// accepts. Until then the invitation holds what the inviting team typed (address, name, role, athlete profile)
// and the team gets none of the account's data, nor the account any of the team's (alerts, digests, calendar).

const setNull = { onDelete: "SET NULL", onUpdate: "CASCADE" } as const;

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.addColumn("invitations", "email", { type: DataTypes.STRING(254), allowNull: true });
  await qi.addColumn("invitations", "name", { type: DataTypes.STRING(120), allowNull: true });
  await qi.addColumn("invitations", "role", { type: DataTypes.STRING(20), allowNull: true });
  await qi.addColumn("invitations", "athlete_id", {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: "athletes", key: "id" },
    ...setNull,
  });
  await qi.addIndex("invitations", ["team_id", "email"], { name: "invitations_team_email" });

  // Memberships of accounts that never set a password were invitations nobody accepted: move each to its
  // invitation (or drop it when there is none), and unlink the athlete profile until the invitee accepts.
  const sequelize = qi.sequelize;
  const pending = await sequelize.query<{
    id: number;
    team_id: number;
    user_id: number;
    role: string;
    email: string;
    name: string;
  }>(
    `SELECT m.id, m.team_id, m.user_id, m.role, u.email, u.name
     FROM memberships m JOIN users u ON u.id = m.user_id WHERE u.password_hash IS NULL`,
    { type: QueryTypes.SELECT },
  );
  for (const m of pending) {
    const [athlete] = await sequelize.query<{ id: number }>(
      "SELECT id FROM athletes WHERE team_id = ? AND user_id = ? LIMIT 1",
      { replacements: [m.team_id, m.user_id], type: QueryTypes.SELECT },
    );
    await sequelize.query(
      `UPDATE invitations SET email = ?, name = ?, role = ?, athlete_id = ? WHERE team_id = ? AND user_id = ? AND purpose = 'invite'`,
      { replacements: [m.email, m.name, m.role, athlete?.id ?? null, m.team_id, m.user_id] },
    );
    await sequelize.query("UPDATE athletes SET user_id = NULL WHERE team_id = ? AND user_id = ?", {
      replacements: [m.team_id, m.user_id],
    });
    await sequelize.query("DELETE FROM memberships WHERE id = ?", { replacements: [m.id] });
  }
  // Older invitations of accounts that did join: the address and role are the account's own.
  await sequelize.query(
    `UPDATE invitations SET email = (SELECT email FROM users WHERE users.id = invitations.user_id) WHERE email IS NULL`,
  );
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  // Open invitations become memberships again (the old model), with their athlete profile linked.
  const sequelize = qi.sequelize;
  const open = await sequelize.query<{ team_id: number; user_id: number; role: string; athlete_id: number | null }>(
    // The latest open invitation per team and account (PostgreSQL refuses bare columns beside a GROUP BY).
    `SELECT team_id, user_id, role, athlete_id FROM invitations
     WHERE id IN (SELECT MAX(id) FROM invitations WHERE purpose = 'invite' AND used_at IS NULL AND role IS NOT NULL
                  GROUP BY team_id, user_id)
       AND NOT EXISTS (SELECT 1 FROM memberships m WHERE m.team_id = invitations.team_id AND m.user_id = invitations.user_id)`,
    { type: QueryTypes.SELECT },
  );
  const now = new Date().toISOString().replace("T", " ").replace("Z", " +00:00");
  for (const i of open) {
    await sequelize.query(
      "INSERT INTO memberships (team_id, user_id, role, created_at, updated_at) VALUES (?, ?, ?, ?, ?)",
      { replacements: [i.team_id, i.user_id, i.role, now, now] },
    );
    if (i.athlete_id !== null)
      await sequelize.query("UPDATE athletes SET user_id = ? WHERE id = ? AND user_id IS NULL", {
        replacements: [i.user_id, i.athlete_id],
      });
  }
  await qi.removeIndex("invitations", "invitations_team_email");
  await qi.removeColumn("invitations", "athlete_id");
  await qi.removeColumn("invitations", "role");
  await qi.removeColumn("invitations", "name");
  await qi.removeColumn("invitations", "email");
};
