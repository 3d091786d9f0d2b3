import { Router } from 'express';
import { z } from 'zod';
import { buildComparison, comparisonCsv, idSchema } from '@tumblewise/shared';
import type { SpinReport } from '@tumblewise/engine';
import type { AppContext } from '../app-context';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { Part, Project, User, Variant } from '../models/init-models';
import { meshReferences } from '../compute/task-references';
import type { PartDrawing } from './part-outline';
import { spinReportPdf } from './spin-report-pdf';

const variantParams = z.object({ variantId: idSchema });
const compareQuery = z.object({
  variants: z
    .string({ message: 'is required: 2 to 6 variant ids separated by commas' })
    .transform((s) =>
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .pipe(z.array(idSchema).min(2, { message: 'must name at least 2 variants' }).max(6, { message: 'must name at most 6 variants' })),
  baseline: idSchema.optional(),
});

const fileName = (s: string) =>
  s
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80) || 'export';

/** Compare 2–6 variants, and downloads: the comparison as CSV, a variant's report as PDF, its document as JSON. */
export function exportRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');

  async function compared(workspaceId: string, ids: string[], baseline?: string) {
    const rows = await Variant.findAll({ where: { id: ids, workspaceId }, include: [{ model: Part, as: 'part' }] });
    if (rows.length !== new Set(ids).size) throw AppError.notFound('One of the variants');
    if (baseline && !ids.includes(baseline)) throw AppError.badRequest('baseline must be one of the compared variants.', 'baseline');
    const ordered = ids.map((id) => rows.find((r) => r.id === id)!);
    const label = (v: Variant) => `${(v as Variant & { part?: Part }).part?.name ?? 'part'} v${v.number}${v.label ? ` ${v.label}` : ''}`;
    return {
      ordered,
      comparison: buildComparison(
        ordered.map((v) => ({ id: v.id, label: label(v), report: v.report })),
        baseline,
      ),
    };
  }

  route({
    method: 'get',
    path: '/compare',
    summary: 'Side-by-side figures of 2–6 variants with deltas against a baseline.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    query: compareQuery,
    success: {
      status: 200,
      description: 'The comparison table (SI units).',
      schema: z.object({ comparison: z.unknown(), variants: z.array(z.unknown()) }),
    },
    handler: async ({ query }, req) => {
      const { ordered, comparison } = await compared(membershipOf(req).workspaceId, query.variants, query.baseline);
      return {
        comparison,
        variants: ordered.map((v) => ({ id: v.id, partId: v.partId, number: v.number, label: v.label, status: v.status })),
      };
    },
  });

  route({
    method: 'get',
    path: '/compare.csv',
    summary: 'The comparison as a CSV download.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    query: compareQuery,
    success: { status: 200, description: 'text/csv' },
    handler: async ({ query }, req, res) => {
      const { comparison } = await compared(membershipOf(req).workspaceId, query.variants, query.baseline);
      res.type('text/csv; charset=utf-8').attachment('comparison.csv').send(comparisonCsv(comparison));
      return undefined;
    },
  });

  route({
    method: 'get',
    path: '/variants/:variantId/export.json',
    summary: 'The variant’s part document as a JSON download.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params: variantParams,
    success: { status: 200, description: 'application/json' },
    handler: async ({ params }, req, res) => {
      const v = await findInWorkspace(Variant, params.variantId, membershipOf(req).workspaceId, 'Variant', {
        include: [{ model: Part, as: 'part' }],
      });
      res
        .attachment(`${fileName(`${(v as Variant & { part?: Part }).part?.name ?? 'part'}-v${v.number}`)}.json`)
        .type('application/json')
        .send(JSON.stringify(v.document, null, 2));
      return undefined;
    },
  });

  route({
    method: 'get',
    path: '/variants/:variantId/export.pdf',
    summary: 'The variant’s spin report as a PDF (tables, a drawing of the part, the cautions).',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params: variantParams,
    success: { status: 200, description: 'application/pdf' },
    handler: async ({ params }, req, res) => {
      const membership = membershipOf(req);
      const v = await findInWorkspace(Variant, params.variantId, membership.workspaceId, 'Variant', {
        include: [{ model: User, as: 'author' }],
      });
      const part = (await Part.findByPk(v.partId))!;
      const project = await Project.findByPk(part.projectId);
      // Drawn on a compute thread: an uploaded mesh can hold a million triangles.
      const references = await meshReferences(membership.workspaceId, v.document);
      const drawing = await ctx.compute.run<PartDrawing>({ kind: 'part-drawing', document: v.document, references });
      const pdf = await spinReportPdf({
        partName: part.name,
        projectName: project?.name ?? '',
        workspaceName: membership.workspace.name,
        number: v.number,
        label: v.label,
        status: v.status,
        author: v.author?.name ?? null,
        createdAt: v.createdAt,
        engineVersion: v.engineVersion,
        drawing,
        report: v.report as SpinReport,
      });
      res
        .type('application/pdf')
        .attachment(`${fileName(`${part.name}-v${v.number}`)}-spin-report.pdf`)
        .send(pdf);
      return undefined;
    },
  });
}
