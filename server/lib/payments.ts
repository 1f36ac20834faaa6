import Stripe from 'stripe';
import type { Config } from '../config';

/** The payments client: the official SDK, pointed at the local fake when host/port are set. */
export function createPayments(stripe: Config['stripe']): Stripe {
  return new Stripe(stripe.secretKey, {
    host: stripe.host,
    port: stripe.port,
    protocol: stripe.protocol,
    maxNetworkRetries: 1,
    timeout: 10_000,
  });
}

export async function checkPayments(client: Stripe): Promise<void> {
  await client.balance.retrieve();
}
