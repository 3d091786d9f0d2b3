import request from 'supertest';
import { startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

it('describes every catalogued route in the OpenAPI document, with schemas from zod', async () => {
  const res = await request(t.app).get('/api/v1/openapi.json').expect(200);
  expect(res.body.openapi).toMatch(/^3\./);
  for (const route of t.ctx.catalogue.routes) {
    const p = '/api/v1' + route.path.replace(/:([A-Za-z]+)/g, '{$1}');
    expect({ path: p, method: route.method, described: !!res.body.paths[p]?.[route.method] }).toEqual({
      path: p,
      method: route.method,
      described: true,
    });
  }
  const signup = res.body.paths['/api/v1/auth/signup'].post;
  const schema = signup.requestBody.content['application/json'].schema;
  expect(schema.required).toEqual(expect.arrayContaining(['workspaceName', 'name', 'email', 'password']));
  expect(schema.properties.password).toMatchObject({ minLength: 10, maxLength: 72 });
  expect(signup.responses['201']).toBeDefined();
  expect(res.body.paths['/api/v1/workspaces/{workspaceId}/members'].get.responses['403']).toBeDefined();
});

it('serves a browsable page at /api/v1/docs', async () => {
  const page = await request(t.app).get('/api/v1/docs/').expect(200);
  expect(page.text).toContain('<div id="swagger-ui">');
});
