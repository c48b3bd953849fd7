import fastifyStatic from '@fastify/static';
import { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { NotFoundFallback } from '../common/problem-details/problem-details.filter';

/**
 * Serves the built console from the same origin as the API. Unknown GETs outside `/v1` that ask for HTML
 * get the app's index page so that client-side routes survive a reload; API paths keep their 404 problem.
 */
export async function registerConsoleHost(app: NestFastifyApplication, consoleDist: string): Promise<NotFoundFallback | undefined> {
  const root = resolve(consoleDist);
  if (!existsSync(join(root, 'index.html'))) return undefined;
  await app.register(fastifyStatic, {
    root,
    prefix: '/',
    wildcard: false,
    index: ['index.html'],
    setHeaders: (response, path) => {
      // Vite fingerprints everything under assets/, so those files never change under the same name.
      if (path.includes(`${join(root, 'assets')}`)) response.header('cache-control', 'public, max-age=31536000, immutable');
    },
  });
  return (request: FastifyRequest, reply: FastifyReply) => {
    const wantsHtml = String(request.headers.accept ?? '').includes('text/html');
    if (request.method !== 'GET' || request.url.startsWith('/v1') || !wantsHtml) return false;
    void reply.type('text/html').sendFile('index.html');
    return true;
  };
}
