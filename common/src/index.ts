export * from './api';
export * from './roles';
export * from './collab';
// Until the engine barrel lands: month arithmetic is needed by the server already.
export { parseMonth, formatMonth, daysInMonth, MONTH_NAMES } from './series/month';
