/**
 * Thrown by the engine when a request is well-formed JSON but cannot be analysed as asked
 * (e.g. unsorted event dates, a period with missing months). The server maps it to a 4xx
 * response with `message`; the zod schemas in api/analysis.ts reject most such input earlier.
 */
export class AnalysisInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'AnalysisInputError';
  }
}
