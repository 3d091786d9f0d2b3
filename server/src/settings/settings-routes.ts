import { Router } from 'express';
import { updateWorkspaceSettingsBodySchema, workspaceSettingsSchema, type WorkspaceSettings } from '@tumblewise/shared';
import type { AppContext } from '../app-context';
import { recordAudit } from '../audit/audit-log';
import { routeGroup } from '../http/api-route';
import { membershipOf } from '../http/authenticate';
import { Workspace } from '../models/init-models';

const DEFAULTS = {
  displayUnits: { length: 'mm', mass: 'g', inertia: 'g·cm²' },
  defaultTolerances: { density: 0.05, size: 0.0002 },
} as const;

function settingsOf(w: Workspace): WorkspaceSettings {
  const s = w.settings as Partial<WorkspaceSettings>;
  return {
    id: w.id,
    name: w.name,
    displayUnits: { ...DEFAULTS.displayUnits, ...s.displayUnits },
    defaultTolerances: { ...DEFAULTS.defaultTolerances, ...s.defaultTolerances },
  };
}

/** Workspace settings: name, default display units, default tolerances. */
export function settingsRoutes(ctx: AppContext, router: Router): void {
  const route = routeGroup(router, ctx.catalogue, '/workspaces/:workspaceId');
  route({
    method: 'get',
    path: '/settings',
    summary: 'The workspace’s name, default display units and default tolerances.',
    access: { kind: 'workspace', permission: 'workspace.read' },
    success: { status: 200, description: 'Settings.', schema: workspaceSettingsSchema },
    handler: async (_i, req) => settingsOf((await Workspace.findByPk(membershipOf(req).workspaceId))!),
  });
  route({
    method: 'patch',
    path: '/settings',
    summary: 'Change the workspace settings.',
    access: { kind: 'workspace', permission: 'settings.manage' },
    body: updateWorkspaceSettingsBodySchema,
    success: { status: 200, description: 'Settings.', schema: workspaceSettingsSchema },
    handler: async ({ body, auth }, req) => {
      const w = (await Workspace.findByPk(membershipOf(req).workspaceId))!;
      const current = settingsOf(w);
      await w.update({
        ...(body.name ? { name: body.name } : {}),
        settings: {
          displayUnits: body.displayUnits ?? current.displayUnits,
          defaultTolerances: body.defaultTolerances ?? current.defaultTolerances,
        },
      });
      await recordAudit({
        workspaceId: w.id,
        actorId: auth!.user.id,
        action: 'workspace.settings_changed',
        targetType: 'workspace',
        targetId: w.id,
        targetLabel: w.name,
        details: body,
      });
      return settingsOf(w);
    },
  });
}
