import Stripe from 'stripe';
import type { Config } from '../config/config';

/**
 * The payment provider through its official SDK. Locally it points at the fake started by infra/;
 * in production PAYMENT_API_URL is the provider's own address and nothing else changes.
 */
export class PaymentProvider {
  readonly client: Stripe;

  constructor(config: Config['payment']) {
    const url = new URL(config.apiUrl);
    this.client = new Stripe(config.secretKey, {
      host: url.hostname,
      port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)),
      protocol: url.protocol.replace(':', '') as 'http' | 'https',
      maxNetworkRetries: 0,
      timeout: 3000,
    });
  }

  /** True when the provider answers an authenticated request. */
  async isReachable(): Promise<boolean> {
    try {
      await this.client.customers.list({ limit: 1 });
      return true;
    } catch {
      return false;
    }
  }
}
