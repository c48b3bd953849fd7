import { randomUUID } from 'node:crypto';
import type { IncomingMessage } from 'node:http';

export const REQUEST_ID_HEADER = 'x-request-id';

/** A caller-supplied id is kept when it is a plausible token, so traces can cross services. */
const ACCEPTABLE_INCOMING_ID = /^[A-Za-z0-9._:-]{8,128}$/;

export function generateRequestId(request: IncomingMessage): string {
  const incoming = request.headers[REQUEST_ID_HEADER];
  if (typeof incoming === 'string' && ACCEPTABLE_INCOMING_ID.test(incoming)) return incoming;
  return randomUUID();
}
