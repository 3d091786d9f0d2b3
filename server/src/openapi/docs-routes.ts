import { Router } from 'express';
import { OpenApiGeneratorV3 } from '@asteasolutions/zod-to-openapi';
import swaggerUi from 'swagger-ui-express';
import type { AppContext } from '../app-context';

/** The OpenAPI description generated from the routes' zod schemas, and a browsable page. */
export function docsRoutes(ctx: AppContext): Router {
  const router = Router();
  let document: object | null = null;
  const build = () => {
    document ??= new OpenApiGeneratorV3(ctx.catalogue.openapi.definitions).generateDocument({
      openapi: '3.0.3',
      info: {
        title: 'Tumblewise API',
        version: '1',
        description:
          'Mass properties, spin stability and trade figures of sports equipment, per workspace. SI units in all data. Errors are `{ "error": { "code", "message", "field"? } }`.',
      },
      servers: [{ url: '/' }],
    });
    return document;
  };
  router.get('/openapi.json', (_req, res) => {
    res.json(build());
  });
  router.use(
    '/docs',
    swaggerUi.serveFiles(undefined, { swaggerUrl: '/api/v1/openapi.json' }),
    swaggerUi.setup(undefined, {
      swaggerUrl: '/api/v1/openapi.json',
      customSiteTitle: 'Tumblewise API',
      swaggerOptions: { url: '/api/v1/openapi.json' },
    }),
  );
  return router;
}
