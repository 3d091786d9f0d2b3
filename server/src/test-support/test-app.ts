import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import { Client } from 'pg';
import request from 'supertest';
import { createApp } from '../app';
import type { AppContext } from '../app-context';
import { loadConfig } from '../config/config';
import { closeContext, createContext } from '../create-context';

export interface TestApp {
  ctx: AppContext;
  app: Express;
  /** Name of this test file's own database. */
  database: string;
  databaseUrl: string;
  close(): Promise<void>;
}

/** Clones the migrated template into a database of this test file's own (≈0.1 s). */
export async function cloneTemplateDatabase(): Promise<{ database: string; url: string }> {
  const database = `t_${process.env.JEST_WORKER_ID ?? '0'}_${randomBytes(4).toString('hex')}`;
  const admin = new Client({ connectionString: process.env.TEST_ADMIN_DATABASE_URL });
  await admin.connect();
  try {
    await admin.query(`CREATE DATABASE ${database} TEMPLATE tw_template`);
  } finally {
    await admin.end();
  }
  const url = new URL(process.env.DATABASE_URL!);
  url.pathname = `/${database}`;
  return { database, url: url.toString() };
}

/** A full app on its own cloned database, with the test services' addresses. */
export async function startTestApp(env: Record<string, string> = {}, options: Parameters<typeof createContext>[1] = {}): Promise<TestApp> {
  const { database, url } = await cloneTemplateDatabase();
  const config = loadConfig({ ...process.env, DATABASE_URL: url, ...env });
  const ctx = createContext(config, options);
  const app = createApp(ctx);
  return { ctx, app, database, databaseUrl: url, close: () => closeContext(ctx) };
}

/** Signs up a new workspace owner and answers the session body and the refresh cookie. */
export async function signUp(
  app: Express,
  overrides: Partial<{ workspaceName: string; name: string; email: string; password: string }> = {},
) {
  const suffix = randomBytes(4).toString('hex');
  const body = {
    workspaceName: `Workshop ${suffix}`,
    name: `Owner ${suffix}`,
    email: `owner-${suffix}@example.test`,
    password: 'correct-horse-42',
    ...overrides,
  };
  const res = await request(app).post('/api/v1/auth/signup').send(body).expect(201);
  return { ...res.body, password: body.password, cookie: refreshCookieOf(res.headers['set-cookie']) } as {
    accessToken: string;
    user: { id: string; email: string; name: string };
    workspace: { id: string; name: string };
    memberships: { workspace: { id: string }; role: string }[];
    password: string;
    cookie: string;
  };
}

/** The `tw_refresh=…` pair from Set-Cookie headers. */
export function refreshCookieOf(setCookie: string[] | string | undefined): string {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const found = list.find((c) => c.startsWith('tw_refresh='));
  if (!found) throw new Error('no refresh cookie was set');
  return found.split(';')[0];
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
