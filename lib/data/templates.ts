import "server-only";
import type { Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import { normaliseBlock } from "@/lib/plan/blocks";
import { toPlanTemplate, type TemplateRow } from "@/lib/plan/dto";
import type { PlanTemplate } from "@/lib/plan/types";
import type { TemplateInput } from "@/lib/validations/template";
import { db } from "@/models";

const FIELDS = ["id", "kind", "title", "running", "drills", "notes", "durationMin", "plannedRpe"] as const;

/** The team's block templates, by kind then title. */
export async function listTemplates({ teamId, transaction }: { teamId: number; transaction?: Transaction }): Promise<PlanTemplate[]> {
  const { BlockTemplate } = await db();
  const rows = await BlockTemplate.findAll({ where: { teamId }, attributes: [...FIELDS], order: [["kind", "ASC"], ["title", "ASC"], ["id", "ASC"]], transaction });
  return rows.map((r) => toPlanTemplate(r.get({ plain: true }) as TemplateRow));
}

/** One template of the team; 404 when it belongs to another team or does not exist. */
export async function getTemplate({ teamId, templateId, transaction }: { teamId: number; templateId: number; transaction?: Transaction }): Promise<PlanTemplate> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.findOne({ where: { id: templateId, teamId }, attributes: [...FIELDS], transaction });
  if (!row) throw new AppError("not_found", "That template was not found", { fields: { templateId: ["Not found in this team"] } });
  return toPlanTemplate(row.get({ plain: true }) as TemplateRow);
}

/** The team a template belongs to (for the permission check), or null. */
export async function findTemplateTeam({ templateId }: { templateId: number }): Promise<number | null> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.findByPk(templateId, { attributes: ["teamId"] });
  return row?.teamId ?? null;
}

export async function createTemplate({ teamId, input }: { teamId: number; input: TemplateInput }): Promise<PlanTemplate> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.create({ teamId, ...normaliseBlock(input) });
  return getTemplate({ teamId, templateId: row.id });
}

export async function updateTemplate({ teamId, templateId, input }: { teamId: number; templateId: number; input: TemplateInput }): Promise<PlanTemplate> {
  const { BlockTemplate } = await db();
  const row = await BlockTemplate.findOne({ where: { id: templateId, teamId } });
  if (!row) throw new AppError("not_found", "That template was not found");
  await row.update(normaliseBlock(input));
  return getTemplate({ teamId, templateId });
}

/** Removes a template; blocks already copied into sessions stay as they are (their link is cleared). */
export async function deleteTemplate({ teamId, templateId }: { teamId: number; templateId: number }): Promise<void> {
  const { BlockTemplate } = await db();
  const removed = await BlockTemplate.destroy({ where: { id: templateId, teamId } });
  if (removed === 0) throw new AppError("not_found", "That template was not found");
}
