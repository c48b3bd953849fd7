/** Calls the public API with an API key, as a customer's program would, outside the browser. */
export async function describeKey(origin: string, key: string): Promise<{ status: number; body: Record<string, unknown> }> {
  const response = await fetch(`${origin}/v1/api-keys/current`, { headers: { authorization: `Bearer ${key}` } });
  const body = (await response.json()) as Record<string, unknown>;
  return { status: response.status, body };
}
