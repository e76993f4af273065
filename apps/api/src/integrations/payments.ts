import Stripe from 'stripe';
import type { Config } from '../config/env.js';

/** The official SDK, pointed by configuration at the hosted service or the local stand-in. */
export function createPaymentsClient(config: Pick<Config, 'STRIPE_SECRET_KEY' | 'STRIPE_API_URL'>): Stripe {
  const url = new URL(config.STRIPE_API_URL);
  return new Stripe(config.STRIPE_SECRET_KEY, {
    host: url.hostname,
    port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)),
    protocol: url.protocol.replace(':', '') as 'http' | 'https',
    maxNetworkRetries: 1,
    timeout: 5_000,
    telemetry: false,
  });
}
