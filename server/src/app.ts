import cookieParser from 'cookie-parser';
import express, { Router } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppContext } from './app-context';
import { authRoutes } from './accounts/auth-routes';
import { meRoutes } from './accounts/me-routes';
import { analysisRoutes } from './analysis/analysis-routes';
import { designRoutes } from './design/design-routes';
import { auditRoutes } from './audit/audit-routes';
import { billingRoutes } from './billing/billing-routes';
import { billingWebhookRoutes } from './billing/billing-webhook';
import { healthRoutes } from './health/health-routes';
import { apiNotFound, errorHandler } from './http/error-handler';
import { authenticate, workspaceGate } from './http/authenticate';
import { invitationAcceptRoutes, invitationRoutes } from './invitations/invitation-routes';
import { memberRoutes } from './members/member-routes';
import { docsRoutes } from './openapi/docs-routes';
import { exportRoutes } from './exports/export-routes';
import { materialRoutes } from './materials/material-routes';
import { measurementRoutes } from './measurements/measurement-routes';
import { meshRoutes } from './meshes/mesh-routes';
import { scatterRoutes } from './scatter/scatter-routes';
import { partRoutes } from './parts/part-routes';
import { operatorRoutes } from './operator/operator-routes';
import { projectRoutes } from './projects/project-routes';
import { settingsRoutes } from './settings/settings-routes';
import { reviewRoutes } from './reviews/review-routes';
import { variantRoutes } from './variants/variant-routes';
import { serveApps } from './static/serve-apps';

/** Builds the Express app (no port): the API under /api/v1 and the two built apps. */
export function createApp(ctx: AppContext): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', ctx.config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'font-src': ["'self'", 'data:'],
          'img-src': ["'self'", 'data:', 'blob:'],
          'connect-src': ["'self'"],
          'upgrade-insecure-requests': null,
        },
      },
      strictTransportSecurity: ctx.config.env === 'production',
    }),
  );
  app.use(
    pinoHttp({
      logger: ctx.logger,
      redact: { paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'], censor: '[hidden]' },
      serializers: {
        req: (req) => ({ id: req.id, method: req.method, url: String(req.url).replace(/token=[^&]+/g, 'token=[hidden]') }),
        res: (res) => ({ statusCode: res.statusCode }),
      },
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api/') },
    }),
  );

  const api = Router();
  // Before the JSON parser: the signature is checked on the raw body.
  api.use(billingWebhookRoutes(ctx));
  // `/analyze` bodies stay text: a worker thread parses them (analysis-routes.ts).
  api.use('/analyze', express.text({ type: 'application/json', limit: ctx.config.limits.partBody }));
  api.use(['/simulate', '/solve', '/sweep'], express.json({ limit: ctx.config.limits.partBody }));
  api.use(express.json({ limit: ctx.config.limits.jsonBody }));
  api.use(cookieParser());
  api.use(authenticate(ctx.tokens, ctx.signedIn));
  api.use(healthRoutes(ctx));
  // Right after health: the live report calls it at nearly every keystroke, and every router
  // passed on the way costs each request its path matching.
  api.use(analysisRoutes(ctx));
  api.use(designRoutes(ctx));
  api.use(docsRoutes(ctx));
  api.use('/auth', authRoutes(ctx));
  api.use('/invitations', invitationAcceptRoutes(ctx));
  api.use(meRoutes(ctx));
  api.use('/operator', operatorRoutes(ctx));

  const workspace = Router({ mergeParams: true });
  workspace.use(workspaceGate);
  memberRoutes(ctx, workspace);
  invitationRoutes(ctx, workspace);
  auditRoutes(ctx, workspace);
  projectRoutes(ctx, workspace);
  materialRoutes(ctx, workspace);
  partRoutes(ctx, workspace);
  variantRoutes(ctx, workspace);
  reviewRoutes(ctx, workspace);
  meshRoutes(ctx, workspace);
  measurementRoutes(ctx, workspace);
  scatterRoutes(ctx, workspace);
  exportRoutes(ctx, workspace);
  billingRoutes(ctx, workspace);
  settingsRoutes(ctx, workspace);
  api.use('/workspaces/:workspaceId', workspace);

  api.use(apiNotFound);
  app.use('/api/v1', api);
  app.use(serveApps(ctx.config.appDistDir));
  app.use(errorHandler(ctx.logger));
  return app;
}
