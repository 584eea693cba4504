import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { ConfigService } from '@nestjs/config';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';
import { trustProxySetting, type AppConfig } from './config/environment';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    bufferLogs: true,
    // The JSON parser also keeps the exact bytes (req.rawBody): the payment webhook's signature is over them.
    rawBody: true,
  });
  configureApp(app);
  const config = app.get<ConfigService<AppConfig, true>>(ConfigService);
  // The proxies allowed to set X-Forwarded-For (TRUST_PROXY): rate limits count by the client's address.
  app.set('trust proxy', trustProxySetting(config.get('TRUST_PROXY', { infer: true })));
  const host = config.get('HOST', { infer: true });
  const port = config.get('PORT', { infer: true });
  await app.listen(port, host);
  console.log(`Keenroute API listening on http://${host}:${port}`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
