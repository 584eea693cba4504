import type { Provider } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import Stripe from 'stripe';
import type { AppConfig } from '../config/environment';

/** Injection token of the payment service's SDK instance. */
export const STRIPE_CLIENT = Symbol('STRIPE_CLIENT');

/**
 * The official SDK, pointed at the local stand-in when STRIPE_API_URL is set (development and tests) and at the real
 * service otherwise. Against the stand-in retries and telemetry are off: a failure should show at once, and there is no
 * one to report latency to.
 */
export function createStripeClient(secretKey: string, apiUrl: string | undefined): Stripe {
  if (!apiUrl) return new Stripe(secretKey);
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'https:' ? 'https' : 'http';
  return new Stripe(secretKey, {
    host: url.hostname,
    port: url.port || (protocol === 'https' ? 443 : 80),
    protocol,
    maxNetworkRetries: 0,
    telemetry: false,
  });
}

export const stripeClientProvider: Provider = {
  provide: STRIPE_CLIENT,
  inject: [ConfigService],
  useFactory: (config: ConfigService<AppConfig, true>) =>
    createStripeClient(
      config.get('STRIPE_SECRET_KEY', { infer: true }),
      config.get('STRIPE_API_URL', { infer: true }) ?? undefined,
    ),
};
