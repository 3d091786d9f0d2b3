import express from 'express';
import pino from 'pino';
import request from 'supertest';
import { z } from 'zod';
import { errorBodySchema, isErrorBody } from '@tumblewise/shared';
import { AppError } from './app-error';
import { errorHandler } from './error-handler';

/** A bare app whose one route throws what it is given, answered by the error handler. */
function appThrowing(error: unknown) {
  const app = express();
  app.get('/boom', () => {
    throw error;
  });
  app.use(errorHandler(pino({ level: 'silent' })));
  return app;
}

it('answers a refused file with its problems, each with its line (null for the file as a whole)', async () => {
  const problems = [
    { line: 3, message: 'value "-3" must be a positive number' },
    { line: null, message: '4 more problems are not listed' },
  ];
  const res = await request(
    appThrowing(AppError.fileProblems('The CSV was not imported: line 3: value "-3" must be a positive number.', 'file', problems)),
  )
    .get('/boom')
    .expect(400);
  expect(res.body).toEqual({
    error: {
      code: 'invalid_input',
      field: 'file',
      message: 'The CSV was not imported: line 3: value "-3" must be a positive number.',
      problems,
    },
  });
  expect(isErrorBody(res.body)).toBe(true);
  expect(errorBodySchema.safeParse(res.body).success).toBe(true);
});

it('leaves `problems` out when there are none, and never leaks them from an unknown error', async () => {
  const plain = await request(appThrowing(AppError.badRequest('name is required.', 'name')))
    .get('/boom')
    .expect(400);
  expect(plain.body).toEqual({ error: { code: 'invalid_input', message: 'name is required.', field: 'name' } });
  const empty = await request(appThrowing(AppError.fileProblems('Refused.', 'file', [])))
    .get('/boom')
    .expect(400);
  expect(empty.body.error).not.toHaveProperty('problems');
  const unknown = Object.assign(new Error('secret detail'), { problems: [{ line: 1, message: 'secret' }] });
  const res = await request(appThrowing(unknown)).get('/boom').expect(500);
  expect(res.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on our side. It has been logged.' } });
});

it('describes `problems` in the error schema of the API description', () => {
  const schema = z.toJSONSchema(errorBodySchema, { target: 'openapi-3.0' }) as unknown as {
    properties: { error: { properties: Record<string, { type?: string; items?: { required?: string[] } }>; required: string[] } };
  };
  const error = schema.properties.error;
  expect(error.required).toEqual(expect.arrayContaining(['code', 'message']));
  expect(error.required).not.toContain('problems');
  expect(error.properties.problems.type).toBe('array');
  expect(error.properties.problems.items!.required).toEqual(['line', 'message']);
});
