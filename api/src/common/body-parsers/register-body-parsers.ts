import fastifyMultipart from '@fastify/multipart';
import { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { FastifyInstance } from 'fastify';
import { ARROW_STREAM_CONTENT_TYPE } from './arrow-body';

/** Content types whose body is handed to the route as the raw request stream (read once, in pieces). */
export const CSV_CONTENT_TYPES = ['text/csv', 'application/csv'];

/**
 * Body formats beyond JSON:
 * - multipart/form-data (dataset uploads): the file part is streamed, never buffered whole; the per-file
 *   limit is applied by the route (the upload limit is much larger than the JSON limit);
 * - text/csv: the raw stream, for `curl --data-binary @file.csv`; the route counts bytes against the
 *   upload limit;
 * - Apache Arrow IPC streams (compact columnar fits): buffered up to the JSON body limit.
 */
export async function registerBodyParsers(app: NestFastifyApplication, bodyLimitBytes: number): Promise<void> {
  await app.register(fastifyMultipart, { limits: { files: 1, fields: 10, fieldSize: 1024 } });
  const fastify = app.getHttpAdapter().getInstance() as FastifyInstance;
  fastify.addContentTypeParser(CSV_CONTENT_TYPES, (_request, payload, done) => done(null, payload));
  fastify.addContentTypeParser(ARROW_STREAM_CONTENT_TYPE, { parseAs: 'buffer', bodyLimit: bodyLimitBytes }, (_request, body, done) =>
    done(null, body),
  );
}
