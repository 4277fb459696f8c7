import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './utils/test-app';

interface OperationObject {
  requestBody?: { content: Record<string, { schema: { $ref?: string } }> };
  responses: Record<string, { content?: Record<string, { schema: unknown }> }>;
  summary?: string;
}

describe('OpenAPI document and Swagger UI', () => {
  let app: INestApplication;
  let doc: { paths: Record<string, Record<string, OperationObject>>; components: { schemas: Record<string, unknown> } };
  beforeAll(async () => {
    app = await createTestApp();
    doc = (await request(app.getHttpServer()).get('/api/docs-json')).body;
  });
  afterAll(async () => {
    await app.close();
  });

  it('serves the Swagger UI at /api/docs', async () => {
    const res = await request(app.getHttpServer()).get('/api/docs/');
    expect(res.status).toBe(200);
    expect(res.text).toContain('swagger-ui');
  });

  it('describes every operation with a 2xx answer and a schema for its body (a DTO for JSON)', () => {
    const ops = Object.entries(doc.paths).flatMap(([path, item]) =>
      Object.entries(item).map(([method, op]) => ({ key: `${method.toUpperCase()} ${path}`, op })),
    );
    expect(ops.length).toBeGreaterThanOrEqual(24);
    const problems: string[] = [];
    for (const { key, op } of ops) {
      const success = Object.keys(op.responses).filter((s) => s.startsWith('2'));
      if (success.length === 0) problems.push(`${key}: no 2xx response`);
      const content = op.requestBody?.content ?? {};
      const json = content['application/json'];
      if (json && !json.schema.$ref?.startsWith('#/components/schemas/'))
        problems.push(`${key}: JSON body has no DTO schema`);
      if (op.requestBody && !json && !Object.values(content).some((c) => c.schema))
        problems.push(`${key}: body has no schema`);
    }
    expect(problems).toEqual([]);
    expect(doc.components.schemas).toHaveProperty('ApiErrorDto');
    expect(doc.components.schemas).toHaveProperty('SignUpDto');
  });

  it('gives every 200/201 answer a response schema (204s and 202s without a body excepted)', () => {
    const missing: string[] = [];
    for (const [path, item] of Object.entries(doc.paths)) {
      for (const [method, op] of Object.entries(item)) {
        for (const status of ['200', '201']) {
          const answer = op.responses[status];
          if (!answer) continue;
          const schemas = Object.values(answer.content ?? {}).map((c) => c.schema);
          const key = `${method.toUpperCase()} ${path} ${status}`;
          if (schemas.length === 0 || schemas.some((s) => !s)) missing.push(key);
        }
      }
    }
    expect(missing).toEqual([]);
  });
});
