import express, { Router } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { idSchema, measurementSchema, type Measurement as MeasurementDto } from '@tumblewise/shared';
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

function dto(m: Measurement, report: unknown): MeasurementDto {
  const predicted = predictedMoment(report, m.axis);
  return {
    id: m.id, axis: m.axis, value: m.value, enteredValue: m.enteredValue, enteredUnit: m.enteredUnit, method: m.method, predicted,
    differencePercent: predicted ? (100 * (m.value - predicted)) / predicted : null, createdAt: m.createdAt.toISOString(),
  };
}

/** Measured moments of a prototype against the variant's prediction. */
export function measurementRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: 1024 * 1024, files: 1 } });

  route({
    method: 'get', path: '/variants/:variantId/measurements', summary: 'Measured moments of the variant’s prototype with the predicted value and the difference.',
    access: { kind: 'workspace', permission: 'workspace.read' }, params,
    success: { status: 200, description: 'Measurements.', schema: z.array(measurementSchema) },
    handler: async ({ params: p }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      const rows = await Measurement.findAll({ where: { workspaceId, variantId: variant.id }, order: [['createdAt', 'ASC'], ['axis', 'ASC']] });
      return rows.map((m) => dto(m, variant.report));
    },
  });

  route({
    method: 'post', path: '/variants/:variantId/measurements', summary: 'Import a CSV of measured moments (header axis,value,unit,method; multipart field "file" or a text/csv body). Bad rows are reported by line and nothing is imported.',
    access: { kind: 'workspace', permission: 'projects.edit' }, params, errors: [413],
    parsers: [upload.single('file'), express.text({ type: ['text/csv', 'text/plain'], limit: '1mb' })],
    success: { status: 201, description: 'All rows imported.', schema: z.array(measurementSchema) },
    handler: async ({ params: p, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      const variant = await findInWorkspace(Variant, p.variantId, workspaceId, 'Variant');
      const text = req.file ? req.file.buffer.toString('utf8') : typeof req.body === 'string' ? req.body : null;
      if (text === null) throw AppError.badRequest('file is required: send the CSV as multipart field "file" or as a text/csv body.', 'file');
      const read = readMeasurementCsv(text);
      if (!read.ok) throw AppError.badRequest(`The CSV was not imported: ${read.problems.slice(0, 20).join('; ')}${read.problems.length > 20 ? ` (and ${read.problems.length - 20} more)` : ''}.`, 'file');
      const created = await ctx.sequelize.transaction(async (transaction) => {
        const rows = await Measurement.bulkCreate(read.rows.map((r) => ({
          workspaceId, variantId: variant.id, axis: r.axis, value: r.value, enteredValue: r.enteredValue, enteredUnit: r.enteredUnit, method: r.method, createdById: auth!.user.id,
        })), { transaction });
        await recordAudit({ workspaceId, actorId: auth!.user.id, action: 'measurements.imported', targetType: 'variant', targetId: variant.id, targetLabel: `v${variant.number}`, details: { rows: rows.length } }, transaction);
        return rows;
      });
      return created.map((m) => dto(m, variant.report));
    },
  });
}
