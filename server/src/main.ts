import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { ConfigService } from '@nestjs/config';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';
import type { AppConfig } from './config/environment';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    bufferLogs: true,
    // The JSON parser also keeps the exact bytes (req.rawBody): the payment webhook's signature is over them.
    rawBody: true,
  });
  // One proxy hop (a load balancer) may set X-Forwarded-For; rate limits use the client's address.
  app.set('trust proxy', 'loopback');
  configureApp(app);
  const config = app.get<ConfigService<AppConfig, true>>(ConfigService);
  const host = config.get('HOST', { infer: true });
  const port = config.get('PORT', { infer: true });
  await app.listen(port, host);
  console.log(`Keenroute API listening on http://${host}:${port}`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
