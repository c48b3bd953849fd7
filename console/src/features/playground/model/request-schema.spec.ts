import { describe, expect, it } from 'vitest';
import { requestBodySchema, toJsonSchema } from '@/features/playground/model/request-schema';

describe('toJsonSchema', () => {
  it('turns an OpenAPI nullable type into a JSON Schema type list', () => {
    expect(toJsonSchema({ type: 'number', nullable: true })).toEqual({ type: ['number', 'null'] });
  });

  it('offers null beside a nullable oneOf', () => {
    expect(toJsonSchema({ oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true })).toEqual({
      anyOf: [{ oneOf: [{ type: 'number' }, { type: 'string' }] }, { type: 'null' }],
    });
  });

  it('rewrites draft-4 boolean exclusive bounds as numeric ones', () => {
    expect(toJsonSchema({ type: 'number', minimum: 0, exclusiveMinimum: true, maximum: 1, exclusiveMaximum: true })).toEqual({
      type: 'number',
      exclusiveMinimum: 0,
      exclusiveMaximum: 1,
    });
    expect(toJsonSchema({ type: 'number', minimum: 2, exclusiveMinimum: false })).toEqual({ type: 'number', minimum: 2 });
  });

  it('keeps property names that look like keywords', () => {
    const schema = { type: 'object', properties: { nullable: { type: 'boolean' }, example: { type: 'string', example: 'x' } } };
    expect(toJsonSchema(schema)).toEqual({ type: 'object', properties: { nullable: { type: 'boolean' }, example: { type: 'string' } } });
  });
});

describe('requestBodySchema', () => {
  const document = {
    openapi: '3.0.0',
    components: {
      schemas: {
        CreateThingDto: { type: 'object', properties: { data: { $ref: '#/components/schemas/DataDto' } }, required: ['data'] },
        DataDto: { type: 'object', properties: { datasetId: { type: 'string', nullable: true } } },
      },
    },
  };

  it('points at the named body schema and carries the components its references need', () => {
    const schema = requestBodySchema(document, 'CreateThingDto');
    expect(schema).toEqual({
      $ref: '#/components/schemas/CreateThingDto',
      components: {
        schemas: {
          CreateThingDto: document.components.schemas.CreateThingDto,
          DataDto: { type: 'object', properties: { datasetId: { type: ['string', 'null'] } } },
        },
      },
    });
  });

  it('answers null for a schema the document lacks or a document without components', () => {
    expect(requestBodySchema(document, 'MissingDto')).toBeNull();
    expect(requestBodySchema({ openapi: '3.0.0' }, 'CreateThingDto')).toBeNull();
  });
});
