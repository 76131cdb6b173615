import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'upwell:isPublic';

/** Marks a route as open without sign-in; every other route needs a token. */
export const Public = () => SetMetadata(IS_PUBLIC, true);
