import "server-only";
import type { Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import { normaliseBlock } from "@/lib/plan/blocks";
import { toPlanTemplate, type TemplateRow } from "@/lib/plan/dto";
import type { PlanTemplate } from "@/lib/plan/types";
import type { TemplateInput } from "@/lib/validations/template";
import { db } from "@/models";

const FIELDS = ["id", "kind", "title", "running", "drills", "notes", "durationMin", "plannedRpe", "version"] as const;

/** The team's block templates, by kind then title. */
export async function listTemplates({
  teamId,
  transaction,
}: {
  teamId: number;
  transaction?: Transaction;
}): Promise<PlanTemplate[]> {
  const { BlockTemplate } = await db();
  const rows = await BlockTemplate.findAll({
    where: { teamId },
    attributes: [...FIELDS],
    order: [
      ["kind", "ASC"],
      ["title", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  return rows.map((r) => toPlanTemplate(r.get({ plain: true }) as TemplateRow));
}

/** One template of the team; 404 when it belongs to another team or does not exist. */
export async function getTemplate({
  teamId,
  templateId,
  transaction,
}: {
  teamId: number;
  templateId: number;
  transaction?: Transaction;
}): Promise<PlanTemplate> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.findOne({ where: { id: templateId, teamId }, attributes: [...FIELDS], transaction });
  if (!row)
    throw new AppError("not_found", "That template was not found", {
      fields: { templateId: ["Not found in this team"] },
    });
  return toPlanTemplate(row.get({ plain: true }) as TemplateRow);
}

/** The team a template belongs to (for the permission check), or null. */
export async function findTemplateTeam({ templateId }: { templateId: number }): Promise<number | null> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.findByPk(templateId, { attributes: ["teamId"] });
  return row?.teamId ?? null;
}

export async function createTemplate({
  teamId,
  input,
}: {
  teamId: number;
  input: TemplateInput;
}): Promise<PlanTemplate> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.create({ teamId, ...normaliseBlock(input) });
  return getTemplate({ teamId, templateId: row.id });
}

/** Replaces a template's content when `version` is the stored one; 409 "stale" with the current template otherwise. */
export async function updateTemplate({
  teamId,
  templateId,
  version,
  input,
}: {
  teamId: number;
  templateId: number;
  version: number;
  input: TemplateInput;
}): Promise<PlanTemplate> {
  const { BlockTemplate, sequelize } = await db();
  return sequelize.transaction(async (transaction) => {
    const row = await BlockTemplate.findOne({
      where: { id: templateId, teamId },
      attributes: [...FIELDS, "teamId"],
      transaction,
    });
    if (!row) throw new AppError("not_found", "That template was not found");
    if (row.version !== version) {
      const current = toPlanTemplate(row.get({ plain: true }) as TemplateRow);
      throw new AppError(
        "stale",
        "Someone changed this block after you opened it. Nothing was saved; reopen it to see the current version.",
        { details: { current } },
      );
    }
    await row.update({ ...normaliseBlock(input), version: version + 1 }, { transaction });
    return getTemplate({ teamId, templateId, transaction });
  });
}

/** Removes a template; blocks already copied into sessions stay as they are (their link is cleared). */
export async function deleteTemplate({ teamId, templateId }: { teamId: number; templateId: number }): Promise<void> {
  const { BlockTemplate } = await db();
  const removed = await BlockTemplate.destroy({ where: { id: templateId, teamId } });
  if (removed === 0) throw new AppError("not_found", "That template was not found");
}
