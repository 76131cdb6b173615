import { BadRequestException, Injectable } from '@nestjs/common';
import { AnalysisInputError, CfTimeError, UnitError } from '@upwell/common';

/** Runs the engine's pure operations for the stateless API. */
@Injectable()
export class AnalysisService {
  /**
   * Calls one engine operation on an already-validated body. Input the schema
   * could not judge (a base period outside the series, incompatible units)
   * comes back from the engine as a typed error and leaves as a 400 that says so.
   */
  run<B, R>(operation: (body: B) => R, body: B): R {
    try {
      return operation(body);
    } catch (err) {
      if (err instanceof AnalysisInputError || err instanceof UnitError || err instanceof CfTimeError) throw new BadRequestException(err.message);
      throw err;
    }
  }
}
