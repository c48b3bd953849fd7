// The editor's JSON schema for one operation's request body, built from the API's own OpenAPI document
// (3.0). Monaco's JSON service speaks JSON Schema, so the few 3.0 dialect words it would misread are
// rewritten: `nullable: true` becomes an explicit null alternative, and the draft-4 boolean
// `exclusiveMinimum`/`exclusiveMaximum` become the numeric form. References keep pointing at
// `#/components/schemas/…`, resolvable because the components travel inside the schema itself.

type JsonObject = { [key: string]: JsonValue };
type JsonValue = string | number | boolean | null | JsonValue[] | JsonObject;

function isObject(value: unknown): value is JsonObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

// Keywords whose value maps names to schemas: the names themselves are left alone.
const schemaMaps = new Set(['properties', 'patternProperties', 'definitions', 'schemas']);

function convertMap(map: JsonValue): JsonValue {
  if (!isObject(map)) return map;
  return Object.fromEntries(Object.entries(map).map(([name, schema]) => [name, toJsonSchema(schema)]));
}

export function toJsonSchema(value: JsonValue): JsonValue {
  if (Array.isArray(value)) return value.map(toJsonSchema);
  if (!isObject(value)) return value;

  const converted: JsonObject = {};
  for (const [key, child] of Object.entries(value)) {
    if (key === 'nullable' || key === 'example') continue;
    converted[key] = schemaMaps.has(key) ? convertMap(child) : toJsonSchema(child);
  }
  for (const bound of ['Minimum', 'Maximum'] as const) {
    const flag = converted[`exclusive${bound}`];
    const limit = converted[bound.toLowerCase()];
    if (flag === true && typeof limit === 'number') {
      converted[`exclusive${bound}`] = limit;
      delete converted[bound.toLowerCase()];
    } else if (typeof flag === 'boolean') {
      delete converted[`exclusive${bound}`];
    }
  }
  if (value.nullable !== true) return converted;
  if (typeof converted.type === 'string' && converted.allOf === undefined && converted.oneOf === undefined) {
    return { ...converted, type: [converted.type, 'null'] };
  }
  return { anyOf: [converted, { type: 'null' }] };
}

/** Schema for the body of the named component, or null when the document does not define it. */
export function requestBodySchema(document: unknown, schemaName: string): JsonObject | null {
  if (!isObject(document) || !isObject(document.components) || !isObject(document.components.schemas)) return null;
  const schemas = document.components.schemas;
  if (!isObject(schemas[schemaName])) return null;
  return {
    $ref: `#/components/schemas/${schemaName}`,
    components: { schemas: convertMap(schemas) },
  };
}
