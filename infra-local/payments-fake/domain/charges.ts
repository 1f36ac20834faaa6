import type { ApiContext } from '../http/context';
import { newId } from '../ids';
import type { Charge, PaymentIntent, PaymentMethod } from '../types';

export type ChargeResult = { succeeded: true } | { succeeded: false; declineCode: string; message: string };

/** Creates the Charge for one confirmation attempt of a PaymentIntent. */
export function createCharge(
  ctx: ApiContext,
  intent: PaymentIntent,
  paymentMethod: PaymentMethod,
  result: ChargeResult,
): Charge {
  const charge: Charge = {
    id: newId('ch'),
    object: 'charge',
    amount: intent.amount,
    amount_captured: result.succeeded ? intent.amount : 0,
    amount_refunded: 0,
    application: null,
    application_fee: null,
    application_fee_amount: null,
    balance_transaction: result.succeeded ? newId('txn') : null,
    billing_details: paymentMethod.billing_details,
    captured: result.succeeded,
    created: ctx.now(),
    currency: intent.currency,
    customer: null,
    description: intent.description,
    disputed: false,
    failure_balance_transaction: null,
    failure_code: result.succeeded ? null : 'card_declined',
    failure_message: result.succeeded ? null : result.message,
    livemode: false,
    metadata: { ...intent.metadata },
    on_behalf_of: null,
    outcome: result.succeeded
      ? {
          network_status: 'approved_by_network',
          reason: null,
          risk_level: 'normal',
          seller_message: 'Payment complete.',
          type: 'authorized',
        }
      : {
          network_status: 'declined_by_network',
          reason: result.declineCode,
          risk_level: 'normal',
          seller_message: 'The bank did not return any further details with this decline.',
          type: 'issuer_declined',
        },
    paid: result.succeeded,
    payment_intent: intent.id,
    payment_method: paymentMethod.id,
    payment_method_details: { type: 'card', card: { ...paymentMethod.card } },
    receipt_email: intent.receipt_email,
    receipt_number: null,
    receipt_url: null,
    refunded: false,
    review: null,
    shipping: null,
    source_transfer: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: result.succeeded ? 'succeeded' : 'failed',
    transfer_data: null,
    transfer_group: intent.transfer_group,
  };
  ctx.store.state.charges[charge.id] = charge;
  return charge;
}
