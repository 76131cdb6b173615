export { parseCsvForImport, type ParseCsvOptions } from './parse-csv-for-import';
export { buildSeriesFromMapping } from './build-series-from-mapping';
export { CsvImportError, type CsvImportErrorCode } from './csv-import-error';
export { decimalYearToMonth, DECIMAL_YEAR_EPSILON } from './parse-month';
