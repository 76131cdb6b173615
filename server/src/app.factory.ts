import { Logger, type INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import helmet from 'helmet';
import { AppModule } from './app.module';
import { installJsonBodyParser } from './common/body-parser';
import { AllExceptionsFilter } from './common/all-exceptions.filter';
import { isLoopbackHost, loadAppConfig, type AppConfig } from './config/app-config';
import { RedisIoAdapter } from './realtime/redis-io.adapter';

/** A configured Upwell app, not yet listening. */
export interface BuiltApp {
  app: INestApplication;
  config: AppConfig;
}

/**
 * Builds the app the same way for `npm start`, the tests and the benchmarks:
 * security headers, JSON parsing with JSON errors, the /api prefix, OpenAPI.
 */
export async function buildApp(env: NodeJS.ProcessEnv = process.env, opts: { logger?: false } = {}): Promise<BuiltApp> {
  const config = loadAppConfig(env);
  const app = await NestFactory.create(AppModule.forConfig(config), {
    bodyParser: false,
    logger: opts.logger === false ? false : ['log', 'warn', 'error'],
  });
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Vega's figures are rendered with its expression interpreter, so no 'unsafe-eval' is needed.
          'img-src': ["'self'", 'data:', 'blob:'],
          'connect-src': ["'self'", 'ws:', 'wss:'],
        },
      },
    }),
  );
  // Browsers may call the API from the app's own origin only; same-origin requests need no CORS headers at all.
  app.enableCors({ origin: [config.appOrigin], credentials: false });
  // Node cuts any request not received within 300 s (requestTimeout), which ended slow but steady
  // uploads; uploads get an idle timeout instead (UploadGateGuard), headers keep Node's headersTimeout.
  (app.getHttpServer() as import('node:http').Server).requestTimeout = 0;
  installJsonBodyParser(app);
  app.setGlobalPrefix('api', { exclude: [] });
  app.useGlobalFilters(new AllExceptionsFilter());
  app.enableShutdownHooks();
  if (config.redisUrl) {
    // Before the gateways start: every socket room then spans all processes on this Redis.
    const adapter = new RedisIoAdapter(app, config.redisUrl);
    try {
      await adapter.connectToRedis();
    } catch (err) {
      await app.close();
      throw err;
    }
    app.useWebSocketAdapter(adapter);
  }
  const doc = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Upwell API')
      .setDescription('Research groups, notebooks, stored series and the anomaly engine of Upwell.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, doc, { jsonDocumentUrl: 'api/docs/openapi.json' });
  return { app, config };
}

/** Starts the server on the configured host and port (0 picks a free one) and says where. */
export async function startApp(env: NodeJS.ProcessEnv = process.env): Promise<BuiltApp & { url: string }> {
  const built = await buildApp(env);
  await built.app.listen(built.config.port, built.config.host);
  const address = built.app.getHttpServer().address() as { port: number };
  const url = `http://localhost:${address.port}`;
  const reach = isLoopbackHost(built.config.host) ? 'from this machine only' : `on ${built.config.host}`;
  new Logger('Upwell').log(`serving ${built.config.webDist ? 'the app and ' : ''}the API at ${url}, ${reach} (data in ${built.config.dataDir})`);
  return { ...built, url };
}
