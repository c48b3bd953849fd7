import { NestFastifyApplication } from '@nestjs/platform-fastify';

/**
 * Builds the real application (same factory as production) for supertest. Import it lazily so a spec can
 * adjust process.env first; each spec file gets its own module registry under jest.
 */
export async function createTestApp(): Promise<NestFastifyApplication> {
  const { createApp } = await import('../../src/configure-app');
  const app = await createApp({ logLevel: 'silent', bodyLimitBytes: 1024 * 1024 });
  await app.init();
  await app.getHttpAdapter().getInstance().ready();
  return app;
}
