import express, { Router } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { idSchema, measurementSchema, measurementsRemovedSchema, type Measurement as MeasurementDto } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { Measurement, Variant } from '../models/init-models';
import { readMeasurementCsv } from './measurement-csv';
import { predictedMoment } from './predicted-moment';

const params = z.object({ variantId: idSchema });
const rowParams = z.object({ variantId: idSchema, measurementId: idSchema });
const importParams = z.object({ variantId: idSchema, importId: idSchema });

/** Problems listed one by one in a refusal; beyond this a last entry counts the rest. */
const MAX_LISTED_PROBLEMS = 100;

function dto(m: Measurement, report: unknown): MeasurementDto {
  const predicted = predictedMoment(report, m.axis);
  return {
    id: m.id,
    axis: m.axis,
    value: m.value,
    enteredValue: m.enteredValue,
    enteredUnit: m.enteredUnit,
    method: m.method,
    predicted,
    differencePercent: predicted ? (100 * (m.value - predicted)) / predicted : null,
    importId: m.importId ?? null,
    createdAt: m.createdAt.toISOString(),
  };
}

/** The refusal of a CSV with bad rows: every problem in `problems` (by line), the first few in the message too. */
function csvRefusal(problems: { line: number | null; message: string }[]): AppError {
  const text = problems
    .slice(0, 20)
    .map((p) => (p.line === null ? p.message : `line ${p.line}: ${p.message}`))
    .join('; ');
  const message = `The CSV was not imported: ${text}${problems.length > 20 ? ` (and ${problems.length - 20} more)` : ''}.`;
  const listed = problems.slice(0, MAX_LISTED_PROBLEMS);
  if (problems.length > MAX_LISTED_PROBLEMS)
    listed.push({
      line: null,
      message: `${problems.length - MAX_LISTED_PROBLEMS} more problems are not listed; fix these and import the file again to see them`,
    });
  return AppError.fileProblems(message, 'file', listed);
}

/** Removes measured rows of one variant in one transaction, with an audit event that keeps what was removed. */
async function removeRows(
  ctx: AppContext,
  rows: Measurement[],
  variant: Variant,
  actorId: string,
  importId: string | null,
): Promise<number> {
  return ctx.sequelize.transaction(async (transaction: Transaction) => {
    const removed = await Measurement.destroy({
      where: { id: rows.map((r) => r.id), workspaceId: variant.workspaceId, variantId: variant.id },
      transaction,
    });
    await recordAudit(
      {
        workspaceId: variant.workspaceId,
        actorId,
        action: 'measurements.removed',
        targetType: 'variant',
        targetId: variant.id,
        targetLabel: `v${variant.number}`,
        details: {
          rows: removed,
          ...(importId ? { importId } : {}),
          readings: rows.map((r) => ({
            axis: r.axis,
            enteredValue: r.enteredValue,
            enteredUnit: r.enteredUnit,
            method: r.method,
            recordedAt: r.createdAt.toISOString(),
          })),
        },
      },
      transaction,
    );
    return removed;
  });
}

/** Measured moments of a prototype against the variant's prediction. */
export function measurementRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: 1024 * 1024, files: 1 } });

  route({
    method: 'get',
    path: '/variants/:variantId/measurements',
    summary: 'Measured moments of the variant’s prototype with the predicted value and the difference.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: { status: 200, description: 'Measurements.', schema: z.array(measurementSchema) },
    handler: async ({ params: p }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      const rows = await Measurement.findAll({
        where: { workspaceId, variantId: variant.id },
        order: [
          ['createdAt', 'ASC'],
          ['axis', 'ASC'],
        ],
      });
      return rows.map((m) => dto(m, variant.report));
    },
  });

  route({
    method: 'post',
    path: '/variants/:variantId/measurements',
    summary:
      'Import a CSV of measured moments (header axis,value,unit,method; multipart field "file" or a text/csv body). The rows share an `importId`, so the import can be removed as a whole. Bad rows are reported by line in the error\'s `problems` and nothing is imported.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params,
    errors: [413],
    parsers: [upload.single('file'), express.text({ type: ['text/csv', 'text/plain'], limit: '1mb' })],
    success: { status: 201, description: 'All rows imported.', schema: z.array(measurementSchema) },
    handler: async ({ params: p, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      const text = req.file ? req.file.buffer.toString('utf8') : typeof req.body === 'string' ? req.body : null;
      if (text === null)
        throw AppError.badRequest('file is required: send the CSV as multipart field "file" or as a text/csv body.', 'file');
      const read = readMeasurementCsv(text);
      if (!read.ok) throw csvRefusal(read.problems);
      const importId = randomUUID();
      const created = await ctx.sequelize.transaction(async (transaction) => {
        const rows = await Measurement.bulkCreate(
          read.rows.map((r) => ({
            workspaceId,
            variantId: variant.id,
            axis: r.axis,
            value: r.value,
            enteredValue: r.enteredValue,
            enteredUnit: r.enteredUnit,
            method: r.method,
            createdById: auth!.user.id,
            importId,
          })),
          { transaction },
        );
        await recordAudit(
          {
            workspaceId,
            actorId: auth!.user.id,
            action: 'measurements.imported',
            targetType: 'variant',
            targetId: variant.id,
            targetLabel: `v${variant.number}`,
            details: { rows: rows.length, importId },
          },
          transaction,
        );
        return rows;
      });
      return created.map((m) => dto(m, variant.report));
    },
  });

  route({
    method: 'delete',
    path: '/variants/:variantId/measurements/imports/:importId',
    summary:
      'Remove every row one CSV import brought in (undoing the import). Rows removed before are not counted; an import with no rows left is not found.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: importParams,
    success: { status: 200, description: 'The import’s rows are removed.', schema: measurementsRemovedSchema },
    handler: async ({ params: p, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      const rows = await Measurement.findAll({
        where: { workspaceId, variantId: variant.id, importId: p.importId },
        order: [
          ['createdAt', 'ASC'],
          ['axis', 'ASC'],
        ],
      });
      if (rows.length === 0) throw AppError.notFound('Import');
      return { removed: await removeRows(ctx, rows, variant, auth!.user.id, p.importId) };
    },
  });

  route({
    method: 'delete',
    path: '/variants/:variantId/measurements/:measurementId',
    summary: 'Remove one measured row.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    params: rowParams,
    success: { status: 200, description: 'The row is removed.', schema: measurementsRemovedSchema },
    handler: async ({ params: p, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      const row = await findInWorkspace(Measurement, p.measurementId, workspaceId, 'Measurement', { where: { variantId: variant.id } });
      return { removed: await removeRows(ctx, [row], variant, auth!.user.id, null) };
    },
  });
}
