import { BadRequestException, ParseUUIDPipe } from '@nestjs/common';

/** Route ids are UUIDs; anything else is a 400 that says which parameter was wrong. */
export function uuidParam(name: string): ParseUUIDPipe {
  return new ParseUUIDPipe({ exceptionFactory: () => new BadRequestException(`${name} in the path is not a valid id`) });
}
