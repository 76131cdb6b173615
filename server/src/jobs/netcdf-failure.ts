import { BadRequestException, UnprocessableEntityException } from '@nestjs/common';
import { NetcdfImportError } from '../series/netcdf';

/**
 * A job's answer, with a NetCDF file that cannot be read turned into a 4xx naming what and where:
 * 400 for a variable the request named but the file lacks, 422 for everything about the file
 * itself (not NetCDF, truncated, sizes that cannot be real or beyond the server's limits).
 */
export async function netcdfFailureAs4xx<T>(job: Promise<T>): Promise<T> {
  try {
    return await job;
  } catch (err) {
    if (!(err instanceof NetcdfImportError)) throw err;
    if (err.code === 'no-such-variable') throw new BadRequestException(err.message);
    throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message: err.message, code: err.code, where: err.where });
  }
}
