import { NetcdfImportError, type NetcdfImportErrorCode } from '../series/netcdf';
import type { JobKind } from './job-kinds';

/** From the pool to a worker: run this job. */
export interface JobRequest {
  id: number;
  kind: JobKind;
  input: unknown;
}

/** A job's error as it crosses the thread boundary (class instances do not survive structured clone). */
export interface JobErrorMessage {
  name: string;
  message: string;
  code?: NetcdfImportErrorCode;
  where?: string;
}

/** From a worker to the pool: progress, the result, or the error of job `id`. */
export type JobReply =
  | { id: number; type: 'progress'; fraction: number }
  | { id: number; type: 'done'; output: unknown }
  | { id: number; type: 'failed'; error: JobErrorMessage };

/** An error as a message. */
export function errorToMessage(error: unknown): JobErrorMessage {
  if (error instanceof NetcdfImportError) return { name: error.name, message: error.message, code: error.code, where: error.where };
  if (error instanceof Error) return { name: error.name, message: error.message };
  return { name: 'Error', message: String(error) };
}

/** The error a message stands for: a `NetcdfImportError` again when it was one. */
export function messageToError(m: JobErrorMessage): Error {
  if (m.name === 'NetcdfImportError' && m.code) return new NetcdfImportError(m.code, m.where ?? '', m.message);
  const error = new Error(m.message);
  error.name = m.name;
  return error;
}
