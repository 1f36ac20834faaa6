import { z } from 'zod';
import { HANDOVER_METHODS, needsAddress } from '../orders/states';
import { plainTextField } from './listing-fields';

const recordId = (what: string) =>
  z.coerce
    .number({ error: `Unknown ${what}.` })
    .int({ error: `Unknown ${what}.` })
    .positive({ error: `Unknown ${what}.` })
    .max(4_294_967_295, { error: `Unknown ${what}.` });

/** Query of GET /api/orders/checkout: the listing to price. */
export const checkoutQuerySchema = z.strictObject({ listing: recordId('listing') });
export type CheckoutQuery = z.infer<typeof checkoutQuerySchema>;

/** Route parameter `:id` of the order routes. */
export const orderParamSchema = z.strictObject({ id: recordId('order') });
export type OrderParam = z.infer<typeof orderParamSchema>;

export const DELIVERY_ADDRESS_MIN = 10;
export const DELIVERY_ADDRESS_MAX = 500;

/** Where the module should go: name, street, town and postcode on separate lines. */
export const deliveryAddressField = plainTextField('delivery address', DELIVERY_ADDRESS_MIN, DELIVERY_ADDRESS_MAX);

/** POST /api/orders: start buying a listed module. The address is asked only when the module is brought to you. */
export const createOrderSchema = z
  .strictObject({
    listingId: recordId('listing'),
    handover: z.enum(HANDOVER_METHODS, { error: 'Choose how the module should reach you.' }),
    deliveryAddress: deliveryAddressField.nullable().optional(),
  })
  .superRefine((o, ctx) => {
    if (needsAddress(o.handover) && !o.deliveryAddress)
      ctx.addIssue({
        code: 'custom',
        path: ['deliveryAddress'],
        message: 'Give the address the module should go to: name, street, town and postcode.',
      });
  });
export type CreateOrderInput = z.infer<typeof createOrderSchema>;

/**
 * The provider's documented test payment methods, offered only with the local payments fake. Each outcome is
 * described in the buyer's words.
 */
export const TEST_CARDS = [
  { id: 'pm_card_visa', label: 'Card that pays', description: 'The payment goes through.' },
  {
    id: 'pm_card_chargeDeclined',
    label: 'Card that is declined',
    description: 'The bank refuses the payment; nothing is taken.',
  },
  {
    id: 'pm_card_chargeDeclinedInsufficientFunds',
    label: 'Card without enough money',
    description: 'The bank refuses for lack of funds; nothing is taken.',
  },
  {
    id: 'pm_card_authenticationRequired',
    label: 'Card that asks you to approve',
    description: 'Your bank asks you to approve the payment before it goes through.',
  },
] as const;
export type TestCardId = (typeof TEST_CARDS)[number]['id'];

/** POST /api/orders/:id/payments: pay what is due now with a payment method. */
export const payOrderSchema = z.strictObject({
  paymentMethod: z
    .string({ error: 'Choose a card to pay with.' })
    .regex(/^pm_[A-Za-z0-9_]{1,100}$/, { error: 'Choose a card to pay with.' }),
});
export type PayOrderInput = z.infer<typeof payOrderSchema>;

/** POST /api/orders/:id/payments/authenticate: the buyer's answer to their bank's approval step. */
export const authenticatePaymentSchema = z.strictObject({
  outcome: z.enum(['success', 'failure'], { error: 'Approve or refuse the payment.' }),
});
export type AuthenticatePaymentInput = z.infer<typeof authenticatePaymentSchema>;
