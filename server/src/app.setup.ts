import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import { Logger } from 'nestjs-pino';
import { createValidationPipe } from './common/validation/validation-pipe';
import type { AppConfig } from './config/environment';
import { securityHeaders } from './config/security-headers';

/** Everything main.ts applies to the app, shared with the e2e tests so they test the same stack. */
export function configureApp(app: INestApplication): INestApplication {
  app.useLogger(app.get(Logger));
  app.setGlobalPrefix('api');
  const https = app
    .get<ConfigService<AppConfig, true>>(ConfigService)
    .get('APP_URL', { infer: true })
    .startsWith('https:');
  app.use(securityHeaders(https));
  app.use(cookieParser());
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Keenroute API')
      .setDescription('Route days, stops, shears, tickets, invoices and stop earnings for a shear sharpening route.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document);
  return app;
}
