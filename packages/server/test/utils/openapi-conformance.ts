import type { OpenAPIObject } from '@nestjs/swagger';

/** The parts of an OpenAPI 3.0 schema object these checks read. */
export interface Schema {
  $ref?: string;
  type?: string;
  format?: string;
  nullable?: boolean;
  enum?: unknown[];
  properties?: Record<string, Schema>;
  required?: string[];
  items?: Schema;
  additionalProperties?: boolean | Schema;
  allOf?: Schema[];
  oneOf?: Schema[];
  anyOf?: Schema[];
}

type Operation = {
  parameters?: { name: string; in: string; schema?: Schema }[];
  requestBody?: { content?: Record<string, { schema?: Schema }> };
  responses?: Record<string, { content?: Record<string, { schema?: Schema }> }>;
};

const METHODS = ['get', 'put', 'post', 'patch', 'delete'] as const;

export function resolveRef(document: OpenAPIObject, ref: string): Schema {
  const name = ref.replace('#/components/schemas/', '');
  const schema = document.components?.schemas?.[name] as Schema | undefined;
  if (!schema) throw new Error(`Unknown schema ${ref}`);
  return schema;
}

/** Every operation of the document as `[method, path, operation]`. */
export function operationsOf(document: OpenAPIObject): [string, string, Operation][] {
  return Object.entries(document.paths).flatMap(([path, item]) =>
    METHODS.filter((method) => item[method]).map((method) => [method, path, item[method] as Operation] as [string, string, Operation]),
  );
}

/** The schema of an operation's JSON answer for `status`. */
export function responseSchema(document: OpenAPIObject, method: string, path: string, status: number): Schema {
  const operation = (document.paths[path] as Record<string, Operation> | undefined)?.[method];
  const schema = operation?.responses?.[String(status)]?.content?.['application/json']?.schema;
  if (!schema) throw new Error(`The contract has no JSON answer ${status} for ${method.toUpperCase()} ${path}`);
  return schema;
}

/**
 * Where `value` (a parsed JSON answer) departs from `schema`: a missing required field, a null
 * the contract does not allow, a wrong type or enum member, or a field the contract does not
 * declare (a client typed from the contract would not see it). Empty when it conforms.
 */
export function conformanceProblems(document: OpenAPIObject, schema: Schema, value: unknown, at = '$'): string[] {
  if (schema.$ref) return conformanceProblems(document, resolveRef(document, schema.$ref), value, at);
  if (value === null) return schema.nullable ? [] : [`${at}: null, but not nullable in the contract`];
  if (schema.allOf) return schema.allOf.flatMap((part) => conformanceProblems(document, part, value, at));
  const choices = schema.oneOf ?? schema.anyOf;
  if (choices) {
    return choices.some((choice) => conformanceProblems(document, choice, value, at).length === 0)
      ? []
      : [`${at}: matches none of the contract's alternatives`];
  }
  if (schema.enum && !schema.enum.includes(value)) return [`${at}: ${JSON.stringify(value)} is not one of ${schema.enum.join(', ')}`];
  switch (schema.type ?? (schema.properties ? 'object' : undefined)) {
    case 'object': {
      if (typeof value !== 'object' || Array.isArray(value)) return [`${at}: expected an object`];
      const record = value as Record<string, unknown>;
      const properties = schema.properties ?? {};
      const missing = (schema.required ?? []).filter((key) => !(key in record)).map((key) => `${at}.${key}: required, but missing`);
      const fields = Object.entries(record).flatMap(([key, field]) => {
        if (properties[key]) return conformanceProblems(document, properties[key], field, `${at}.${key}`);
        if (typeof schema.additionalProperties === 'object') {
          return conformanceProblems(document, schema.additionalProperties, field, `${at}.${key}`);
        }
        return schema.additionalProperties ? [] : [`${at}.${key}: not in the contract`];
      });
      return [...missing, ...fields];
    }
    case 'array':
      if (!Array.isArray(value)) return [`${at}: expected an array`];
      return schema.items ? value.flatMap((item, i) => conformanceProblems(document, schema.items as Schema, item, `${at}[${i}]`)) : [];
    case 'string':
      if (typeof value !== 'string') return [`${at}: expected a string`];
      return schema.format === 'date-time' && Number.isNaN(Date.parse(value)) ? [`${at}: not a date-time`] : [];
    case 'number':
      return typeof value === 'number' && Number.isFinite(value) ? [] : [`${at}: expected a number`];
    case 'integer':
      return Number.isInteger(value) ? [] : [`${at}: expected an integer`];
    case 'boolean':
      return typeof value === 'boolean' ? [] : [`${at}: expected a boolean`];
    default:
      return [];
  }
}

/**
 * Schema nodes that give a typed client too little: a property with no type, an object with no
 * properties, an array with no item type, or an enum of several members written inline (name it
 * with `enumName` so clients get one named type and one list of its members).
 */
export function weakSchemaProblems(document: OpenAPIObject): string[] {
  const problems: string[] = [];
  const visit = (schema: Schema | undefined, at: string, named = false): void => {
    if (!schema || schema.$ref) return;
    if (schema.enum && schema.enum.length > 1 && !named)
      problems.push(`${at}: inline enum (${schema.enum.join(', ')}); give it an enumName`);
    if (schema.allOf ?? schema.oneOf ?? schema.anyOf) {
      [...(schema.allOf ?? []), ...(schema.oneOf ?? []), ...(schema.anyOf ?? [])].forEach((part, i) => visit(part, `${at}/${i}`));
      return;
    }
    if (!schema.type && !schema.enum && !schema.properties) problems.push(`${at}: no type`);
    if (schema.type === 'object' && !schema.properties && typeof schema.additionalProperties !== 'object') {
      problems.push(`${at}: an object with no properties`);
    }
    if (schema.type === 'array') {
      if (!schema.items) problems.push(`${at}: an array with no item type`);
      else visit(schema.items, `${at}[]`);
    }
    for (const [key, property] of Object.entries(schema.properties ?? {})) visit(property, `${at}.${key}`);
  };
  for (const [name, schema] of Object.entries(document.components?.schemas ?? {})) visit(schema as Schema, name, true);
  for (const [method, path, operation] of operationsOf(document)) {
    const where = `${method.toUpperCase()} ${path}`;
    for (const parameter of operation.parameters ?? []) visit(parameter.schema, `${where} ${parameter.in} ${parameter.name}`);
    for (const [type, media] of Object.entries(operation.requestBody?.content ?? {})) {
      if (type === 'application/json') visit(media.schema, `${where} body`);
    }
    for (const [status, response] of Object.entries(operation.responses ?? {})) {
      const json = response.content?.['application/json'];
      if (json) visit(json.schema, `${where} ${status}`);
    }
  }
  return problems;
}

/** Successful answers (2xx other than 204) that declare no body: a typed client gets `unknown`. */
export function untypedAnswers(document: OpenAPIObject): string[] {
  return operationsOf(document).flatMap(([method, path, operation]) =>
    Object.entries(operation.responses ?? {})
      .filter(([status]) => /^2\d\d$/.test(status) && status !== '204')
      .filter(([, response]) => !response.content || Object.values(response.content).some((media) => !media.schema))
      .map(([status]) => `${method.toUpperCase()} ${path} ${status}`),
  );
}
