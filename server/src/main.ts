import 'reflect-metadata';
import { startApp } from './app.factory';

startApp().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
