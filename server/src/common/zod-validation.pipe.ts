import { BadRequestException, type PipeTransform } from '@nestjs/common';
import type { ZodType, z } from 'zod';

/** One problem with a request, as the API reports it. */
export interface InputIssue {
  path: string;
  message: string;
}

/** Turns zod issues into sentences a person can act on. */
export function describeIssues(error: z.ZodError): { message: string; issues: InputIssue[] } {
  const issues = error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.path.length === 0 && issue.code === 'invalid_type' ? 'the request body must be a JSON object' : issue.message,
  }));
  const message = issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; ');
  return { message, issues };
}

/** Validates a body or query against one endpoint's schema and hands on the parsed value. */
export class ZodValidationPipe<S extends ZodType> implements PipeTransform<unknown, z.output<S>> {
  constructor(private readonly schema: S) {}

  transform(value: unknown): z.output<S> {
    const result = this.schema.safeParse(value);
    if (result.success) return result.data;
    const { message, issues } = describeIssues(result.error);
    throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message, issues });
  }
}
