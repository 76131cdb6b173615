import { applyDecorators } from '@nestjs/common';
import { ApiBody, ApiQuery } from '@nestjs/swagger';
import { z, type ZodType } from 'zod';

/** JSON Schema of a request schema, in the form the OpenAPI document takes. */
export function openApiSchema(schema: ZodType): Record<string, unknown> {
  const json = z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any', target: 'openapi-3.0' }) as Record<string, unknown>;
  delete json.$schema;
  return json;
}

/** Documents a route's JSON body from the same schema that validates it. */
export function ApiJsonBody(schema: ZodType, description?: string) {
  return applyDecorators(ApiBody({ schema: openApiSchema(schema) as never, description }));
}

/** Documents a route's query parameters from the schema that validates them. */
export function ApiQueryFrom(schema: z.ZodObject) {
  return applyDecorators(
    ...Object.entries(schema.shape).map(([name, field]) =>
      ApiQuery({ name, required: !(field as ZodType).safeParse(undefined).success, schema: openApiSchema(field as ZodType) as never }),
    ),
  );
}
