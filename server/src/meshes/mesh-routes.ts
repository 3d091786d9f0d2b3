import { createHash } from 'node:crypto';
import { Router } from 'express';
import multer from 'multer';
import { Op, type Transaction } from 'sequelize';
import { z } from 'zod';
import { idSchema, meshInUseMessage, meshSchema, meshUsageSchema, type MeshUsage } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import type { MeshCheckResult } from '../compute/compute-tasks';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../http/app-error';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { findInWorkspace } from '../http/find-in-workspace';
import { Mesh, Part, Variant } from '../models/init-models';

const params = z.object({ meshId: idSchema });
const uploadFields = z.object({ name: z.string().trim().max(200, { message: 'must be at most 200 characters' }).optional() });

/** STL uploads: checked on a worker (closed, manifold, oriented, finite), stored with their SHA-256. */
export function meshRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: ctx.config.limits.meshUploadBytes, files: 1, fields: 5 } });

  route({
    method: 'get',
    path: '/meshes',
    summary: 'Uploaded meshes of the workspace.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    success: { status: 200, description: 'Meshes, newest first (without their bytes).', schema: z.array(meshSchema) },
    handler: async (_i, req) => {
      const rows = await Mesh.findAll({
        where: { workspaceId: membershipOf(req).workspaceId },
        attributes: { exclude: ['data'] },
        order: [['createdAt', 'DESC']],
      });
      return rows.map((m) => m.toDto());
    },
  });

  route({
    method: 'post',
    path: '/meshes',
    summary: 'Upload a binary or ASCII STL (multipart field "file"); a file that is not a closed solid is refused and nothing is stored.',
    access: { kind: 'workspace', permission: 'projects.edit' },
    parsers: [upload.single('file')],
    errors: [413, 422],
    success: { status: 201, description: 'The stored mesh with its check report.', schema: meshSchema },
    handler: async (_i, req) => {
      const { workspaceId } = membershipOf(req);
      const file = req.file;
      if (!file) throw AppError.badRequest('file is required: send the STL as multipart/form-data in the field "file".', 'file');
      const fields = uploadFields.safeParse(req.body ?? {});
      if (!fields.success) throw AppError.badRequest(`name ${fields.error.issues[0].message}.`, 'name');
      const check = await ctx.compute.run<MeshCheckResult>({
        kind: 'check-mesh',
        bytes: new Uint8Array(file.buffer),
        maxTriangles: ctx.config.limits.meshTriangles,
      });
      const blocking = check.problems.filter((p) => !p.fixed);
      if (!check.ok || blocking.length > 0) {
        const list = (blocking.length ? blocking : check.problems).map((p) => p.message).join('; ');
        const tooLarge = blocking.some((p) => p.code === 'too_large');
        throw new AppError(tooLarge ? 413 : 422, tooLarge ? 'too_large' : 'mesh_invalid', `The STL cannot be used: ${list}.`, 'file');
      }
      const mesh = await Mesh.create({
        workspaceId,
        name: fields.data.name || file.originalname.slice(0, 200) || 'mesh.stl',
        sha256: createHash('sha256').update(file.buffer).digest('hex'),
        byteSize: file.size,
        triangleCount: check.triangleCount,
        format: check.format!,
        data: file.buffer,
        report: { fixed: check.problems.filter((p) => p.fixed).map((p) => p.message), warnings: [] },
        createdById: membershipOf(req).userId,
      });
      await recordAudit({
        workspaceId,
        actorId: mesh.createdById,
        action: 'mesh.uploaded',
        targetType: 'mesh',
        targetId: mesh.id,
        targetLabel: mesh.name,
        details: { triangles: mesh.triangleCount },
      });
      return mesh.toDto();
    },
  });

  route({
    method: 'get',
    path: '/meshes/:meshId',
    summary: 'One uploaded mesh (without its bytes).',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: { status: 200, description: 'The mesh with its check report.', schema: meshSchema },
    handler: async ({ params: p }, req) => {
      const mesh = await findInWorkspace(Mesh, p.meshId, membershipOf(req).workspaceId, 'Mesh', { attributes: { exclude: ['data'] } });
      return mesh.toDto();
    },
  });

  route({
    method: 'get',
    path: '/meshes/:meshId/geometry',
    summary:
      "The uploaded STL file as stored (binary or ASCII, `model/stl`), for drawing; its units are the file's own (the part document's `scale` converts them).",
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: {
      status: 200,
      description: 'model/stl: the bytes that passed the upload check. ETag is the SHA-256, so a repeated request answers 304.',
    },
    handler: async ({ params: p }, req, res) => {
      const mesh = await findInWorkspace(Mesh, p.meshId, membershipOf(req).workspaceId, 'Mesh');
      // A stored mesh never changes (a new upload is a new row): the browser may keep it.
      res.set({ 'Cache-Control': 'private, max-age=86400', ETag: `"${mesh.sha256}"` });
      res.attachment(stlFileName(mesh.name)).type('model/stl').send(mesh.data);
      return undefined;
    },
  });

  route({
    method: 'get',
    path: '/meshes/:meshId/usage',
    summary: 'The parts that use an uploaded mesh, in their draft or in saved variants; a mesh in use cannot be deleted.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    params,
    success: { status: 200, description: 'The parts using the mesh, by name (empty when none).', schema: meshUsageSchema },
    handler: async ({ params: p }, req) => {
      const { workspaceId } = membershipOf(req);
      const mesh = await findInWorkspace(Mesh, p.meshId, workspaceId, 'Mesh', { attributes: ['id'] });
      return meshUsage(workspaceId, mesh.id);
    },
  });

  route({
    method: 'delete',
    path: '/meshes/:meshId',
    summary:
      "Delete an uploaded mesh. A mesh that a part's draft or a saved variant uses is kept (409 mesh_in_use, naming the parts): the variants were computed from it and must stay reproducible.",
    access: { kind: 'workspace', permission: 'projects.edit' },
    params,
    errors: [409],
    success: { status: 204, description: 'Deleted; the audit trail records it.' },
    handler: async ({ params: p, auth }, req) => {
      const { workspaceId } = membershipOf(req);
      await ctx.sequelize.transaction(async (transaction) => {
        const mesh = await findInWorkspace(Mesh, p.meshId, workspaceId, 'Mesh', {
          attributes: { exclude: ['data'] },
          transaction,
          lock: transaction.LOCK.UPDATE,
        });
        const usage = await meshUsage(workspaceId, mesh.id, transaction);
        if (usage.parts.length) throw AppError.conflict('mesh_in_use', meshInUseMessage(mesh.name, usage), 'meshId');
        await mesh.destroy({ transaction });
        await recordAudit(
          {
            workspaceId,
            actorId: auth!.user.id,
            action: 'mesh.deleted',
            targetType: 'mesh',
            targetId: mesh.id,
            targetLabel: mesh.name,
            details: { triangles: mesh.triangleCount, sha256: mesh.sha256 },
          },
          transaction,
        );
      });
      return undefined;
    },
  });
}

/** A document (draft or variant) that has a primitive referring to the mesh: JSONB containment, `@>`. */
const usesMesh = (meshId: string) => ({ [Op.contains]: { primitives: [{ meshId }] } });

/** The workspace's parts whose draft or saved variants refer to the mesh, by part name. */
export async function meshUsage(workspaceId: string, meshId: string, transaction?: Transaction): Promise<MeshUsage> {
  const [drafts, variants] = await Promise.all([
    Part.findAll({ where: { workspaceId, draft: usesMesh(meshId) }, attributes: ['id'], transaction }),
    Variant.findAll({
      where: { workspaceId, document: usesMesh(meshId) },
      attributes: ['partId', 'number'],
      order: [['number', 'ASC']],
      transaction,
    }),
  ]);
  const inDraft = new Set(drafts.map((d) => d.id));
  const partIds = [...new Set([...inDraft, ...variants.map((v) => v.partId)])];
  if (!partIds.length) return { parts: [] };
  const parts = await Part.findAll({
    where: { workspaceId, id: partIds },
    attributes: ['id', 'projectId', 'name'],
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
  return {
    parts: parts.map((part) => ({
      partId: part.id,
      projectId: part.projectId,
      partName: part.name,
      inDraft: inDraft.has(part.id),
      variantNumbers: variants.filter((v) => v.partId === part.id).map((v) => v.number),
    })),
  };
}

/** A download name for a stored mesh: its name, safe for a header, ending in .stl. */
export function stlFileName(name: string): string {
  const base =
    name
      .replace(/[^\w.\- ]+/g, '_')
      .trim()
      .slice(0, 120) || 'mesh';
  return /\.stl$/i.test(base) ? base : `${base}.stl`;
}
