import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { App } from 'supertest/types';
import { AppModule } from '../../../src/app.module';
import { configureApp } from '../../../src/app.setup';
import { AuthThrottlerGuard } from '../../../src/auth/guards/auth-throttler.guard';

const open = { canActivate: () => true };

/**
 * The whole app as createTestApp makes it, with the rate limits lifted: a sweep of hundreds of bad requests from one
 * address would otherwise meet 429s before the validation it is there to test. Rate limits have their own tests.
 */
export async function createUnthrottledApp(): Promise<INestApplication<App>> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideGuard(ThrottlerGuard)
    .useValue(open)
    .overrideGuard(AuthThrottlerGuard)
    .useValue(open)
    .compile();
  const app = moduleRef.createNestApplication<INestApplication<App>>({ rawBody: true, logger: false });
  configureApp(app);
  await app.init();
  return app;
}
