import type { Request, RequestHandler, Response, Router } from 'express';
import type { z } from 'zod';
import type { RouteConfig } from '@asteasolutions/zod-to-openapi';
import { type Permission, can } from '@tumblewise/shared';
import { AppError } from './app-error';
import { parseOrThrow } from './validation';
import type { RequestAuth } from './authenticate';
import type { ApiCatalogue } from './api-catalogue';

/** Who may call a route. */
export type Access =
  { kind: 'public' } | { kind: 'optional-user' } | { kind: 'user' } | { kind: 'workspace'; permission: Permission } | { kind: 'operator' };

export interface RouteInput<B, Q, P> {
  body: B;
  query: Q;
  params: P;
  auth: RequestAuth | null;
}

export interface RouteSpec<B extends z.ZodType, Q extends z.ZodType, P extends z.ZodType> {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  /** Express path below the router's mount point, e.g. `/members/:memberId`. */
  path: string;
  summary: string;
  access: Access;
  body?: B;
  /** `engine`: the body schema only describes the route; the engine validates (with its own paths). */
  bodyValidatedBy?: 'route' | 'engine';
  query?: Q;
  /** Parameters besides `workspaceId` (checked by the workspace gate). */
  params?: P;
  /** Status answered on success, and the schema of its body (none: 204). */
  success: { status: number; description: string; schema?: z.ZodType };
  /** Other statuses this route answers, for the API description. */
  errors?: number[];
  /** Middleware run before the access check (rate limits). */
  before?: RequestHandler[];
  /** Writes are refused in a read-only or suspended workspace, except routes marked here (paying the bill). */
  allowWhenLocked?: boolean;
  /** Middleware run after the access check and before validation (upload parsers). */
  parsers?: RequestHandler[];
  handler: (input: RouteInput<z.output<B>, z.output<Q>, z.output<P>>, req: Request, res: Response) => Promise<unknown> | unknown;
}

const ERROR_TEXT: Record<number, string> = {
  400: 'Bad input; the error names the field.',
  401: 'Not signed in.',
  403: 'The role is too low.',
  404: 'Not found, or another workspace’s.',
  409: 'Conflict with the current state.',
  410: 'The link expired or was used.',
  413: 'Too large.',
  422: 'Cannot be analysed.',
  429: 'Too many attempts; see Retry-After.',
  503: 'A service is unavailable.',
};

/**
 * Declares one API route: registers it with Express (access check → validation → handler → JSON),
 * in the OpenAPI description from the same zod schemas, and in the route catalogue the
 * role and tenancy test matrices are generated from.
 */
export function apiRoute<B extends z.ZodType, Q extends z.ZodType, P extends z.ZodType>(
  router: Router,
  catalogue: ApiCatalogue,
  mount: string,
  spec: RouteSpec<B, Q, P>,
): void {
  const fullPath = mount + spec.path;
  catalogue.add({ method: spec.method, path: fullPath, access: spec.access });
  catalogue.openapi.registerPath(describe(fullPath, spec));

  const access: RequestHandler = (req, _res, next) => {
    checkAccess(spec.access, (req as Request & { auth?: RequestAuth }).auth ?? null, req);
    if (spec.access.kind === 'workspace' && spec.method !== 'get' && !spec.allowWhenLocked) assertWritable(req);
    next();
  };
  const handler: RequestHandler = async (req, res) => {
    const auth = (req as Request & { auth?: RequestAuth }).auth ?? null;
    // The workspace gate already checked :workspaceId of workspace routes; other routes keep it.
    const { workspaceId: _w, ...rest } = req.params as Record<string, string>;
    const ownParams = spec.access.kind === 'workspace' ? rest : (req.params as Record<string, string>);
    const input = {
      body: spec.body && spec.bodyValidatedBy !== 'engine' ? parseOrThrow(spec.body, req.body, 'body') : req.body,
      query: spec.query ? parseOrThrow(spec.query, req.query, 'query') : undefined,
      params: spec.params ? parseParams(spec.params, ownParams) : ownParams,
      auth,
    } as RouteInput<z.output<B>, z.output<Q>, z.output<P>>;
    const result = await spec.handler(input, req, res);
    if (res.headersSent) return;
    if (result === undefined) res.status(spec.success.status === 200 ? 204 : spec.success.status).end();
    else res.status(spec.success.status).json(result);
  };
  router[spec.method](spec.path, ...(spec.before ?? []), access, ...(spec.parsers ?? []), handler);
}

/** A malformed id in the path is as good as a missing row: 404, so ids cannot be probed. */
function parseParams<P extends z.ZodType>(schema: P, params: Record<string, string>): z.output<P> {
  const result = schema.safeParse(params);
  if (!result.success) throw AppError.notFound();
  return result.data;
}

function checkAccess(access: Access, auth: RequestAuth | null, req: Request): void {
  if (access.kind === 'public' || access.kind === 'optional-user') return;
  if (!auth) throw AppError.unauthorized();
  if (access.kind === 'operator' && !auth.user.isOperator) throw AppError.forbidden('Only platform operators may do this.');
  if (access.kind === 'workspace') {
    const membership = (req as Request & { membership?: { role: Parameters<typeof can>[0] } }).membership;
    if (!membership) throw AppError.notFound('Workspace');
    if (!can(membership.role, access.permission)) throw AppError.forbidden();
  }
}

/** A suspended or read-only workspace takes no writes (exports and reads go on). */
function assertWritable(req: Request): void {
  const workspace = (req as Request & { membership?: { workspace: { effectiveState(): string; suspendedReason?: string | null } } })
    .membership?.workspace;
  const state = workspace?.effectiveState();
  if (state === 'suspended') {
    throw new AppError(
      403,
      'workspace_suspended',
      `This workspace is suspended by the platform${workspace?.suspendedReason ? ` (${workspace.suspendedReason})` : ''}: you can sign in and read, but not change anything.`,
    );
  }
  if (state === 'read_only') {
    throw new AppError(
      403,
      'workspace_read_only',
      'This workspace is read-only because a payment is overdue: an owner can update the payment method under Subscription. Exports still work.',
    );
  }
}

function describe(fullPath: string, spec: RouteSpec<z.ZodType, z.ZodType, z.ZodType>): RouteConfig {
  const openPath = '/api/v1' + fullPath.replace(/:([A-Za-z]+)/g, '{$1}');
  const tag = fullPath.split('/').filter((s) => s && !s.startsWith(':'))[fullPath.startsWith('/workspaces') ? 1 : 0] ?? 'api';
  const responses: RouteConfig['responses'] = {
    [spec.success.status]: spec.success.schema
      ? { description: spec.success.description, content: { 'application/json': { schema: spec.success.schema } } }
      : { description: spec.success.description },
  };
  const statuses = new Set([
    400,
    ...(spec.access.kind === 'public' || spec.access.kind === 'optional-user' ? [] : [401]),
    ...(spec.access.kind === 'workspace' ? [403, 404] : []),
    ...(spec.errors ?? []),
  ]);
  for (const status of statuses) {
    responses[status] = {
      description: ERROR_TEXT[status] ?? 'Error',
      content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } },
    };
  }
  const pathParams = [...fullPath.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]);
  return {
    method: spec.method,
    path: openPath,
    summary: spec.summary,
    tags: [tag],
    security: spec.access.kind === 'public' ? [] : [{ bearer: [] }],
    request: {
      ...(spec.body ? { body: { content: { 'application/json': { schema: spec.body } } } } : {}),
      ...(spec.query ? { query: spec.query as never } : {}),
    },
    parameters: pathParams.map((name) => ({
      name,
      in: 'path' as const,
      required: true,
      schema: { type: 'string' as const, format: 'uuid' },
    })),
    responses,
  };
}

/** `apiRoute` bound to one router and mount point, keeping the schema types of each route. */
export function routeGroup(router: Router, catalogue: ApiCatalogue, mount: string) {
  return <
    B extends z.ZodType = z.ZodUndefined,
    Q extends z.ZodType = z.ZodUndefined,
    P extends z.ZodType = z.ZodType<Record<string, string>>,
  >(
    spec: RouteSpec<B, Q, P>,
  ) => apiRoute(router, catalogue, mount, spec);
}
