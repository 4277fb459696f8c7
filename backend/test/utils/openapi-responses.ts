// Validates real answers against the response schemas of the served OpenAPI document (not a test file itself).
import Ajv from 'ajv';

type Schema = Record<string, unknown>;

export interface OpenApiDocument {
  paths: Record<
    string,
    Record<string, { responses: Record<string, { content?: Record<string, { schema?: Schema }> }> }>
  >;
  components: { schemas: Record<string, Schema> };
}

const DOC_ID = 'openapi.json';

/**
 * OpenAPI 3.0 schema → JSON Schema (draft-07) for ajv: `nullable: true` becomes "or null", component refs point
 * into one registered document, and an object with listed properties admits no others, so an undocumented field
 * in an answer fails as surely as a missing or mistyped one.
 */
export function toJsonSchema(schema: unknown): unknown {
  if (Array.isArray(schema)) return schema.map(toJsonSchema);
  if (!schema || typeof schema !== 'object') return schema;
  const out: Schema = {};
  for (const [k, v] of Object.entries(schema as Schema)) {
    if (k === 'nullable') continue;
    if (k === '$ref' && typeof v === 'string') out[k] = v.replace('#/components/schemas/', `${DOC_ID}#/definitions/`);
    else if (k === 'properties')
      out[k] = Object.fromEntries(Object.entries(v as Schema).map(([p, s]) => [p, toJsonSchema(s)]));
    else if (k === 'enum' || k === 'required' || k === 'example') out[k] = v;
    else out[k] = toJsonSchema(v);
  }
  if (out.properties && !('additionalProperties' in out)) out.additionalProperties = false;
  return (schema as Schema).nullable === true ? { anyOf: [out, { type: 'null' }] } : out;
}

/** `check(method, path template, status, body)` → the problems of one answer (empty when it matches its schema). */
export function responseValidator(
  doc: OpenApiDocument,
): (method: string, path: string, status: number, body: unknown) => string[] {
  const ajv = new Ajv({ allErrors: true, format: 'full' });
  const definitions = Object.fromEntries(
    Object.entries(doc.components.schemas).map(([name, s]) => [name, toJsonSchema(s)]),
  );
  ajv.addSchema({ $id: DOC_ID, definitions });
  // One compiled validator per route and status: the tests check the same routes many times.
  const compiled = new Map<string, ReturnType<typeof ajv.compile>>();
  return (method, path, status, body) => {
    const schema =
      doc.paths[path]?.[method.toLowerCase()]?.responses[String(status)]?.content?.['application/json']?.schema;
    if (!schema) return [`${method.toUpperCase()} ${path} ${status}: no JSON response schema in the document`];
    const key = `${method} ${path} ${status}`;
    const validate = compiled.get(key) ?? ajv.compile(toJsonSchema(schema) as object);
    compiled.set(key, validate);
    if (validate(body)) return [];
    return (validate.errors ?? []).map(
      (e) =>
        `${method.toUpperCase()} ${path} ${status}: body${e.dataPath} ${e.message}${e.params && 'additionalProperty' in e.params ? ` (${String(e.params.additionalProperty)})` : ''}`,
    );
  };
}
