import { OpenAPIRegistry } from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import { errorBodySchema } from '@tumblewise/shared';
import type { Access } from './api-route';

export interface CataloguedRoute {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  /** Express path below /api/v1, e.g. `/workspaces/:workspaceId/members/:memberId`. */
  path: string;
  access: Access;
}

/**
 * Every API route the app declared, and its OpenAPI registry. The role and tenancy matrices
 * in the tests are generated from `routes`, so a new route cannot be left out of them.
 */
export class ApiCatalogue {
  readonly routes: CataloguedRoute[] = [];
  readonly openapi = new OpenAPIRegistry();

  constructor() {
    this.openapi.registerComponent('schemas', 'Error', z.toJSONSchema(errorBodySchema, { target: 'openapi-3.0' }) as never);
    this.openapi.registerComponent('securitySchemes', 'bearer', { type: 'http', scheme: 'bearer', bearerFormat: 'JWT' });
  }

  add(route: CataloguedRoute): void {
    this.routes.push(route);
  }
}
