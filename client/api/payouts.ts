import type { FeeRatesInput } from '@shared/schemas/order-aftercare';
import type { BalancesView, FeeRatesView, FeeScheduleView, PayoutAccountView } from '@shared/types/order-aftercare';
import { http, request } from './http';

/** Start or continue connecting a payout account: answers the provider's onboarding page to send the person to. */
export const connectPayoutAccount = () => http.post<{ url: string }>('/api/payouts/account', {});

/** The payout account as the provider last reported it. */
export async function payoutAccount(signal?: AbortSignal): Promise<PayoutAccountView> {
  return (await http.get<{ account: PayoutAccountView }>('/api/payouts/account', undefined, signal)).account;
}

/** Held, ready and paid-out money, and the latest sales. */
export const balances = (signal?: AbortSignal) => http.get<BalancesView>('/api/payouts/balances', undefined, signal);

/** The rates that apply now (public: the seller's payout preview uses them). */
export async function currentFees(signal?: AbortSignal): Promise<FeeRatesView> {
  return (await http.get<{ fees: FeeRatesView }>('/api/fees', undefined, signal)).fees;
}

/** The rates and their history (administrators). */
export const feeSchedule = (signal?: AbortSignal) => http.get<FeeScheduleView>('/api/admin/fees', undefined, signal);

/** New rates for orders made from now on (administrators). */
export const setFees = (input: FeeRatesInput) => request<FeeScheduleView>('PUT', '/api/admin/fees', { body: input });
