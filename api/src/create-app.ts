import 'reflect-metadata';
import { ConsoleLogger, type INestApplication, type LogLevel } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import helmet from 'helmet';
import { CAUTION } from 'ligament';
import { AppModule } from './app.module.js';
import { HttpErrorFilter } from './common/http-error.filter.js';
import { createValidationPipe } from './common/validation.js';

export interface CreateAppOptions {
  readonly logger?: LogLevel[] | false;
}

export function buildOpenApi(app: INestApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Ligament audit service')
    .setDescription(
      'Submittal uploads, independent recompute of net sections, discrepancies, review stamps and mail. ' +
        'Errors always have the shape { statusCode, error, message, details? }. ' +
        CAUTION,
    )
    .setVersion('0.1.0')
    .addBearerAuth({
      type: 'http',
      scheme: 'bearer',
      description: 'A sign-in JWT from POST /api/auth/login, or a personal API token (lgt_…)',
    })
    .build();
  return SwaggerModule.createDocument(app, config);
}

/**
 * The configured application, initialised (migrations applied) but not listening. main.ts listens;
 * tests and the OpenAPI script use it as it is.
 */
export async function createApp(options: CreateAppOptions = {}): Promise<NestExpressApplication> {
  const levels = options.logger ?? ['error', 'warn'];
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    // Colour codes only on a terminal (and Nest drops them under NO_COLOR): a log file gets plain text.
    logger:
      levels === false
        ? false
        : new ConsoleLogger({
            logLevels: levels,
            colors: Boolean(process.stdout.isTTY),
          }),
    abortOnError: false,
  });
  app.setGlobalPrefix('api');
  // The demo is served over plain http://localhost: keep helmet's CSP but without upgrade-insecure-requests.
  app.use(helmet({ contentSecurityPolicy: { directives: { upgradeInsecureRequests: null } } }));
  app.set('query parser', 'extended');
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new HttpErrorFilter());
  SwaggerModule.setup('api/docs', app, () => buildOpenApi(app), { jsonDocumentUrl: 'api/docs-json' });
  await app.init();
  return app;
}
