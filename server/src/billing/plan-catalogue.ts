import type { Plan } from '@tumblewise/shared';
import type { Config } from '../config/config';

/** The plans on offer (our own names), priced from config. */
export function planCatalogue(config: Config['billing']): Plan[] {
  return [
    {
      id: 'bench-monthly',
      name: 'Bench',
      description: `Per seat, billed monthly, with a ${config.trialDays}-day trial. Every member and every pending invitation takes a seat.`,
      pricePerSeatMonthly: config.pricePerSeatMonthly,
      currency: config.currency,
      trialDays: config.trialDays,
    },
  ];
}
