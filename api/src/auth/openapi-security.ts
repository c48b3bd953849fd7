import type { OpenAPIObject } from '@nestjs/swagger';
import { CSRF_SECURITY } from './auth.decorators';

const READ_METHODS = ['get', 'head', 'options'] as const;

/** The CSRF header is checked only on state-changing methods, so read operations do not list it. */
export function omitConsoleCsrfOnReads(document: OpenAPIObject): OpenAPIObject {
  for (const operations of Object.values(document.paths)) {
    for (const method of READ_METHODS) {
      const operation = operations[method];
      if (!operation?.security) continue;
      operation.security = operation.security
        .map((requirement) => Object.fromEntries(Object.entries(requirement).filter(([name]) => name !== CSRF_SECURITY)))
        .filter((requirement) => Object.keys(requirement).length > 0);
      if (operation.security.length === 0) delete operation.security;
    }
  }
  return document;
}
