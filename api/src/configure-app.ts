import fastifyCookie from '@fastify/cookie';
import fastifyCsrfProtection from '@fastify/csrf-protection';
import fastifyHelmet from '@fastify/helmet';
import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, NestFastifyApplication } from '@nestjs/platform-fastify';
import { DocumentBuilder, OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { AppModule } from './app.module';
import { API_KEY_BEARER_SECURITY, API_KEY_HEADER_SECURITY } from './api-keys/api-key.decorators';
import { API_KEY_HEADER } from './api-keys/api-key.strategies';
import { CSRF_COOKIE, CSRF_HEADER, csrfCookieOptions, SESSION_COOKIE } from './auth/auth-cookies';
import { CSRF_SECURITY, SESSION_SECURITY } from './auth/auth.decorators';
import { omitConsoleCsrfOnReads } from './auth/openapi-security';
import { securityConfig } from './config/configuration';
import { ProblemDetailsFilter } from './common/problem-details/problem-details.filter';
import { createValidationPipe } from './common/problem-details/validation.pipe';
import { addProblemResponses } from './common/problem-details/openapi-problems';
import { generateRequestId, REQUEST_ID_HEADER } from './common/request-context/request-id';
import { JsonLogger } from './common/logging/json-logger';
import { registerConsoleHost } from './console-host/console-host';
import { registerBodyParsers } from './common/body-parsers/register-body-parsers';
import { API_VERSION } from './version';

export interface CreateAppOptions {
  /** `silent` in tests; the HTTP layer and Nest both log JSON lines otherwise. */
  logLevel?: 'fatal' | 'error' | 'warn' | 'info' | 'debug' | 'silent';
  bodyLimitBytes?: number;
  consoleDist?: string;
  /** Build the module graph without connecting to anything (used to write the OpenAPI document). */
  preview?: boolean;
}

/**
 * Creates the application exactly as production runs it; e2e tests and the OpenAPI writer call this too,
 * so what they check is what ships.
 */
export async function createApp(options: CreateAppOptions = {}): Promise<NestFastifyApplication> {
  const logLevel = options.logLevel ?? 'info';
  const adapter = new FastifyAdapter({
    // Same line shape as JsonLogger: level as a word, ISO time, `reqId` naming the request.
    logger:
      logLevel === 'silent'
        ? false
        : {
            level: logLevel,
            formatters: { level: (label: string) => ({ level: label }) },
            timestamp: () => `,"time":"${new Date().toISOString()}"`,
          },
    genReqId: generateRequestId,
    bodyLimit: options.bodyLimitBytes ?? 64 * 1024 * 1024,
    trustProxy: false,
  });
  const app = await NestFactory.create<NestFastifyApplication>(AppModule, adapter, {
    logger: new JsonLogger(logLevel),
    preview: options.preview ?? false,
    abortOnError: false,
  });
  const fastify = app.getHttpAdapter().getInstance();

  fastify.addHook('onRequest', async (request, reply) => {
    reply.header(REQUEST_ID_HEADER, request.id);
  });

  await app.register(fastifyHelmet, {
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        // Radix Themes and the code editor set inline style attributes.
        styleSrc: ["'self'", "'unsafe-inline'"],
        fontSrc: ["'self'", 'data:'],
        imgSrc: ["'self'", 'data:'],
        workerSrc: ["'self'", 'blob:'],
        connectSrc: ["'self'"],
        frameAncestors: ["'none'"],
      },
    },
  });
  await app.register(fastifyCookie);
  // The CSRF secret sits in its own httpOnly cookie; CsrfService checks the token on console routes only,
  // so the public API (API keys, no cookies) is unaffected.
  await app.register(fastifyCsrfProtection, {
    cookieKey: CSRF_COOKIE,
    cookieOpts: csrfCookieOptions(securityConfig().secureCookies),
    getToken: (request) => {
      const value = request.headers[CSRF_HEADER];
      return Array.isArray(value) ? value[0] : value;
    },
  });

  await registerBodyParsers(app, options.bodyLimitBytes ?? 64 * 1024 * 1024);

  const notFoundFallback = options.consoleDist ? await registerConsoleHost(app, options.consoleDist) : undefined;
  app.useGlobalFilters(new ProblemDetailsFilter(notFoundFallback));
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();

  SwaggerModule.setup('v1/docs', app, () => buildOpenApiDocument(app), {
    ui: false,
    raw: ['json'],
    jsonDocumentUrl: 'v1/openapi.json',
  });
  return app;
}

export function buildOpenApiDocument(app: NestFastifyApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Leastline API')
    .setDescription(
      'Exact least-squares regression with full inference, served over HTTP. Every failure is RFC 9457 ' +
        'problem details (`application/problem+json`). Results are statistical estimates under the stated ' +
        'model assumptions, not financial advice.',
    )
    .setVersion(API_VERSION)
    .addBearerAuth(
      { type: 'http', scheme: 'bearer', description: 'A Leastline API key (llsq1_…) as a bearer token.' },
      API_KEY_BEARER_SECURITY,
    )
    .addApiKey({ type: 'apiKey', in: 'header', name: API_KEY_HEADER, description: 'A Leastline API key (llsq1_…).' }, API_KEY_HEADER_SECURITY)
    .addCookieAuth(SESSION_COOKIE, { type: 'apiKey', in: 'cookie', name: SESSION_COOKIE, description: 'Console session.' }, SESSION_SECURITY)
    .addApiKey(
      {
        type: 'apiKey',
        in: 'header',
        name: 'X-Leastline-Csrf',
        description: 'CSRF token from GET /v1/session/csrf-token; required on POST, PUT, PATCH and DELETE of console routes.',
      },
      CSRF_SECURITY,
    )
    .build();
  return addProblemResponses(
    omitConsoleCsrfOnReads(SwaggerModule.createDocument(app, config, { operationIdFactory: (_controller, method) => method })),
  );
}
