import 'reflect-metadata';
import { Controller, Get, HttpCode, type INestApplication, Query } from '@nestjs/common';
import { APP_FILTER, APP_INTERCEPTOR } from '@nestjs/core';
import { Test } from '@nestjs/testing';
import { healthSchema } from '@linkloom/shared';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../config/app-config.js';
import { AllExceptionsFilter } from '../exception.filter.js';
import { ApiNoContentResponse, ApiZodResponse } from './api-response.decorators.js';
import { ResponseContractInterceptor } from './response-contract.interceptor.js';

const HEALTHY = { status: 'ok', database: 'pglite', version: '1.2.3', demo: false };

/** Answers the Health shape as told: as documented, with a field renamed, with one extra, or with dates. */
@Controller('probe')
class ProbeController {
  @Get('health')
  @ApiZodResponse(healthSchema)
  health(@Query('variant') variant?: string) {
    if (variant === 'renamed') {
      const { database, ...rest } = HEALTHY;
      return { ...rest, databaseKind: database };
    }
    if (variant === 'extra') return { ...HEALTHY, internalPath: '/srv/data' };
    return HEALTHY;
  }

  @Get('empty')
  @HttpCode(204)
  @ApiNoContentResponse()
  empty(@Query('variant') variant?: string) {
    return variant === 'body' ? { surprise: true } : undefined;
  }

  @Get('undeclared')
  undeclared() {
    return { anything: 1 };
  }
}

describe('the response contract check', () => {
  let app: INestApplication;
  beforeAll(async () => {
    const moduleRef = await Test.createTestingModule({
      controllers: [ProbeController],
      providers: [
        { provide: APP_INTERCEPTOR, useClass: ResponseContractInterceptor },
        { provide: APP_FILTER, useClass: AllExceptionsFilter },
      ],
    }).compile();
    app = moduleRef.createNestApplication({ logger: false });
    await app.init();
  });
  afterAll(async () => app?.close());

  it('lets an answer of the documented shape through unchanged', async () => {
    const response = await request(app.getHttpServer()).get('/probe/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual(HEALTHY);
  });

  it('answers 500 naming the field when a field was renamed', async () => {
    const response = await request(app.getHttpServer()).get('/probe/health?variant=renamed');
    expect(response.status).toBe(500);
    expect(response.body.code).toBe('RESPONSE_CONTRACT');
    expect(response.body.message).toContain('Health');
    // The missing field is reported first; undocumented extras only once the documented fields are right.
    expect(response.body.details).toEqual([expect.stringMatching(/^database: Invalid option/)]);
  });

  it('refuses a field the schema does not describe (the document would not mention it)', async () => {
    const response = await request(app.getHttpServer()).get('/probe/health?variant=extra');
    expect(response.status).toBe(500);
    expect(response.body.details).toEqual(['internalPath: not described by the schema']);
  });

  it('holds 204 routes to an empty body and refuses routes that declare no contract', async () => {
    expect((await request(app.getHttpServer()).get('/probe/empty')).status).toBe(204);
    expect((await request(app.getHttpServer()).get('/probe/empty?variant=body')).status).toBe(500);
    const undeclared = await request(app.getHttpServer()).get('/probe/undeclared');
    expect(undeclared.status).toBe(500);
    expect(undeclared.body.message).toMatch(/declares no response contract/);
  });
});

describe('when the check runs', () => {
  it('is on by default, off in production unless CHECK_RESPONSES says otherwise', () => {
    const base = { JWT_SECRET: 'a-secret-that-is-long-enough-for-the-check-0123' };
    expect(loadConfig(base, { inMemoryDatabase: true }).checkResponses).toBe(true);
    expect(loadConfig({ ...base, NODE_ENV: 'production' }, { inMemoryDatabase: true }).checkResponses).toBe(false);
    expect(loadConfig({ ...base, NODE_ENV: 'production', CHECK_RESPONSES: 'true' }, { inMemoryDatabase: true }).checkResponses).toBe(true);
  });
});
