import { randomBytes } from 'node:crypto';

/**
 * Stripe-shaped objects for the fake: every top-level field Stripe's example object has (see
 * reference/stripe-fixtures.json and the contract test), filled with what a test-mode account would show.
 */
export const fakeId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;

type Obj = Record<string, unknown>;
const list = (url: string) => ({ object: 'list', data: [], has_more: false, url });
const address = () => ({ city: null, country: null, line1: null, line2: null, postal_code: null, state: null });

export function accountObject(values: Obj & { id: string; created: number }): Obj {
  return {
    object: 'account',
    business_profile: { mcc: null, name: null, product_description: null, support_email: null, support_phone: null, support_url: null, url: null },
    business_type: null,
    capabilities: { card_payments: 'inactive', transfers: 'inactive' },
    charges_enabled: false,
    controller: { type: 'application' },
    country: 'US',
    default_currency: 'usd',
    details_submitted: false,
    email: null,
    external_accounts: list(`/v1/accounts/${values.id}/external_accounts`),
    future_requirements: { alternatives: [], current_deadline: null, currently_due: [], disabled_reason: null, errors: [], eventually_due: [], past_due: [], pending_verification: [] },
    metadata: {},
    payouts_enabled: false,
    requirements: { alternatives: [], current_deadline: null, currently_due: ['external_account'], disabled_reason: null, errors: [], eventually_due: [], past_due: [], pending_verification: [] },
    settings: {},
    tos_acceptance: { date: null, ip: null, user_agent: null },
    type: 'express',
    ...values,
  };
}

export function checkoutSessionObject(values: Obj & { id: string; created: number; url: string }): Obj {
  return {
    object: 'checkout.session',
    after_expiration: { recovery: null },
    allow_promotion_codes: null,
    amount_subtotal: null,
    amount_total: null,
    automatic_tax: { enabled: false, liability: null, status: null, provider: null },
    billing_address_collection: null,
    cancel_url: null,
    client_reference_id: null,
    client_secret: null,
    consent: { promotions: null, terms_of_service: null },
    consent_collection: { payment_method_reuse_agreement: null, promotions: null, terms_of_service: null },
    currency: 'usd',
    custom_fields: [],
    custom_text: { after_submit: null, shipping_address: null, submit: null, terms_of_service_acceptance: null },
    customer: null,
    customer_creation: 'if_required',
    customer_details: { address: address(), email: null, name: null, phone: null, tax_exempt: 'none', tax_ids: [], business_name: null, individual_name: null },
    customer_email: null,
    expires_at: values.created + 24 * 3600,
    invoice: null,
    invoice_creation: { enabled: false, invoice_data: { account_tax_ids: null, custom_fields: null, description: null, footer: null, issuer: null, metadata: {}, rendering_options: null } },
    livemode: false,
    locale: null,
    metadata: {},
    mode: 'payment',
    payment_intent: null,
    payment_link: null,
    payment_method_collection: 'if_required',
    payment_method_configuration_details: { id: 'pmc_fake', parent: null },
    payment_method_options: {},
    payment_method_types: ['card'],
    payment_status: 'unpaid',
    phone_number_collection: { enabled: false },
    recovered_from: null,
    saved_payment_method_options: { allow_redisplay_filters: null, payment_method_remove: null, payment_method_save: null },
    setup_intent: null,
    shipping_address_collection: { allowed_countries: ['US'] },
    shipping_cost: { amount_subtotal: 0, amount_tax: 0, amount_total: 0, shipping_rate: null },
    shipping_options: [],
    status: 'open',
    submit_type: null,
    subscription: null,
    success_url: null,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: 'hosted',
    adaptive_pricing: { enabled: false },
    discounts: [],
    collected_information: { shipping_details: null, business_name: null, individual_name: null },
    permissions: { update_shipping_details: null },
    wallet_options: {},
    origin_context: null,
    currency_conversion: { amount_subtotal: 0, amount_total: 0, fx_rate: '1', source_currency: 'usd' },
    customer_account: null,
    integration_identifier: null,
    managed_payments: { enabled: false },
    ...values,
  };
}

export function paymentIntentObject(values: Obj & { id: string; created: number; amount: number }): Obj {
  return {
    object: 'payment_intent',
    amount_capturable: 0,
    amount_details: { tip: {} },
    amount_received: 0,
    application: null,
    application_fee_amount: null,
    automatic_payment_methods: { enabled: false },
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic',
    client_secret: `${values.id}_secret_${randomBytes(8).toString('hex')}`,
    confirmation_method: 'automatic',
    currency: 'usd',
    customer: null,
    description: null,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: {},
    next_action: null,
    on_behalf_of: null,
    payment_method: null,
    payment_method_configuration_details: { id: 'pmc_fake', parent: null },
    payment_method_options: { card: { request_three_d_secure: 'automatic' } },
    payment_method_types: ['card'],
    processing: null,
    receipt_email: null,
    review: null,
    setup_future_usage: null,
    shipping: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: 'requires_payment_method',
    transfer_data: null,
    transfer_group: null,
    source: null,
    excluded_payment_method_types: null,
    customer_account: null,
    managed_payments: { enabled: false },
    ...values,
  };
}

export function chargeObject(values: Obj & { id: string; created: number; amount: number; last4: string; paid: boolean }): Obj {
  const { last4, paid, ...rest } = values;
  return {
    object: 'charge',
    amount_captured: paid ? values.amount : 0,
    amount_refunded: 0,
    application: null,
    application_fee: null,
    application_fee_amount: null,
    balance_transaction: paid ? fakeId('txn') : null,
    billing_details: { address: address(), email: null, name: null, phone: null, tax_id: null },
    calculated_statement_descriptor: 'BALEPROOF',
    captured: paid,
    currency: 'usd',
    customer: null,
    description: null,
    disputed: false,
    failure_balance_transaction: null,
    failure_code: paid ? null : 'card_declined',
    failure_message: paid ? null : 'Your card was declined.',
    fraud_details: {},
    livemode: false,
    metadata: {},
    on_behalf_of: null,
    outcome: paid
      ? { network_status: 'approved_by_network', reason: null, risk_level: 'normal', seller_message: 'Payment complete.', type: 'authorized' }
      : { network_status: 'declined_by_network', reason: 'generic_decline', risk_level: 'normal', seller_message: 'The bank did not return any further details with this decline.', type: 'issuer_declined' },
    paid,
    payment_intent: null,
    payment_method: fakeId('pm'),
    payment_method_details: { type: 'card', card: { brand: 'visa', last4, country: 'US', exp_month: 12, exp_year: 2034, funding: 'credit' } },
    receipt_email: null,
    receipt_number: null,
    receipt_url: `https://fake.stripe.invalid/receipts/${values.id}`,
    refunded: false,
    refunds: list(`/v1/charges/${values.id}/refunds`),
    review: null,
    shipping: null,
    source: null,
    source_transfer: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: paid ? 'succeeded' : 'failed',
    transfer_data: null,
    transfer_group: null,
    ...rest,
  };
}

export function refundObject(values: Obj & { id: string; created: number; amount: number; charge: string }): Obj {
  return {
    object: 'refund',
    balance_transaction: fakeId('txn'),
    currency: 'usd',
    destination_details: { type: 'card', card: { type: 'refund' } },
    metadata: {},
    payment_intent: null,
    reason: null,
    receipt_number: null,
    source_transfer_reversal: null,
    status: 'succeeded',
    transfer_reversal: null,
    customer: null,
    customer_account: null,
    payment_method: null,
    ...values,
  };
}

export function transferObject(values: Obj & { id: string; created: number; amount: number; destination: string }): Obj {
  return {
    object: 'transfer',
    amount_reversed: 0,
    balance_transaction: fakeId('txn'),
    currency: 'usd',
    description: null,
    destination_payment: fakeId('py'),
    livemode: false,
    metadata: {},
    reversals: list(`/v1/transfers/${values.id}/reversals`),
    reversed: false,
    source_transaction: null,
    source_type: 'card',
    transfer_group: null,
    ...values,
  };
}

export function eventObject(values: { id: string; created: number; type: string; object: Obj }): Obj {
  return {
    object: 'event',
    api_version: '2025-01-27.acacia',
    created: values.created,
    data: { object: values.object },
    id: values.id,
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type: values.type,
  };
}

export function balanceObject(availableCents: number, pendingCents: number): Obj {
  return {
    object: 'balance',
    available: [{ amount: availableCents, currency: 'usd', source_types: { card: availableCents } }],
    connect_reserved: [{ amount: 0, currency: 'usd' }],
    livemode: false,
    pending: [{ amount: pendingCents, currency: 'usd', source_types: { card: pendingCents } }],
  };
}
