import 'server-only';
import Stripe from 'stripe';
import { z } from 'zod';
import { env } from '@/lib/env';
import { AppError } from '@/lib/server/errors';

// The payment provider through its official SDK. STRIPE_API_URL points it at the local fake in
// development and tests (scripts/fakes/payments.fake.mjs); unset, the SDK talks to the real service.
const paymentsEnvSchema = z.object({
  STRIPE_SECRET_KEY: z.string().min(8),
  STRIPE_WEBHOOK_SECRET: z.string().min(8),
  STRIPE_API_URL: z.url().optional(),
});

type PaymentsEnv = z.infer<typeof paymentsEnvSchema>;

function paymentsEnv(): PaymentsEnv {
  const e = env();
  const parsed = paymentsEnvSchema.safeParse({
    STRIPE_SECRET_KEY: e.STRIPE_SECRET_KEY,
    STRIPE_WEBHOOK_SECRET: e.STRIPE_WEBHOOK_SECRET,
    STRIPE_API_URL: e.STRIPE_API_URL,
  });
  if (!parsed.success)
    throw new AppError(503, 'Online payment is not set up on this server (STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET).');
  return parsed.data;
}

let client: { key: string; stripe: Stripe } | undefined;

export function stripeClient(): Stripe {
  const config = paymentsEnv();
  if (client?.key === `${config.STRIPE_SECRET_KEY}|${config.STRIPE_API_URL}`) return client.stripe;
  const api = config.STRIPE_API_URL ? new URL(config.STRIPE_API_URL) : undefined;
  const stripe = new Stripe(config.STRIPE_SECRET_KEY, {
    ...(api
      ? { host: api.hostname, port: Number(api.port), protocol: api.protocol.replace(':', '') as 'http' | 'https' }
      : {}),
    maxNetworkRetries: 2,
    timeout: 10_000,
  });
  client = { key: `${config.STRIPE_SECRET_KEY}|${config.STRIPE_API_URL}`, stripe };
  return stripe;
}

/** Verifies the Stripe-Signature header over the raw body; a bad or missing signature is a 400. */
export function verifiedEvent(rawBody: string, signature: string | null): Stripe.Event {
  const { STRIPE_WEBHOOK_SECRET } = paymentsEnv();
  if (!signature) throw new AppError(400, 'Missing Stripe-Signature header.');
  try {
    return stripeClient().webhooks.constructEvent(rawBody, signature, STRIPE_WEBHOOK_SECRET);
  } catch {
    throw new AppError(400, 'The webhook signature does not match.');
  }
}
