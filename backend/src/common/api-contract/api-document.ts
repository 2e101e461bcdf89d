import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { componentRef, contractComponents } from './openapi-schema.js';

const ERROR_RESPONSE = {
  description: 'The request was refused: `{ statusCode, code, message, details }` (docs/api.md "Errors").',
  content: { 'application/json': { schema: { $ref: componentRef('ApiError') } } },
};

/** The OpenAPI document: routes from the controllers, response shapes from the shared schemas. */
export function buildApiDocument(app: INestApplication): OpenAPIObject {
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Linkloom API')
      .setDescription('Doc sets, imports, analysis runs, findings, work and mail. Send `Authorization: Bearer <token>`.')
      .setVersion('1')
      .addBearerAuth()
      .build(),
  );
  document.components = { ...document.components, schemas: { ...document.components?.schemas, ...contractComponents() } };
  for (const methods of Object.values(document.paths)) {
    for (const operation of Object.values(methods)) {
      if (typeof operation === 'object' && operation && 'responses' in operation) operation.responses['4XX'] ??= ERROR_RESPONSE;
    }
  }
  return document;
}

export function mountApiDocs(app: INestApplication): void {
  SwaggerModule.setup('api/docs', app, buildApiDocument(app), { jsonDocumentUrl: 'api/docs-json' });
}
