import { newId } from './ids';
import type { Ledger } from './ledger';
import type { z } from 'zod';
import type { customerCreateSchema, customerListSchema } from './params';
import { noSuch } from './provider-error';
import type { CustomerObject, ListObject } from './types';

type CustomerParams = z.infer<typeof customerCreateSchema>;

/** Creates a customer object. */
export function createCustomer(ledger: Ledger, params: CustomerParams): CustomerObject {
  const customer: CustomerObject = {
    id: newId('cus', 14),
    object: 'customer',
    address: null,
    balance: 0,
    created: ledger.nowSec(),
    currency: null,
    default_source: null,
    delinquent: false,
    description: params.description ?? null,
    email: params.email ?? null,
    invoice_prefix: newId('INV', 6).slice(4).toUpperCase(),
    livemode: false,
    metadata: params.metadata ?? {},
    name: params.name ?? null,
    phone: params.phone ?? null,
    preferred_locales: [],
    shipping: null,
    tax_exempt: 'none',
  };
  ledger.state.customers[customer.id] = customer;
  ledger.commit();
  return customer;
}

/** Returns the customer or throws a provider 404. */
export function getCustomer(ledger: Ledger, id: string): CustomerObject {
  const customer = ledger.state.customers[id];
  if (!customer) throw noSuch('customer', id);
  return customer;
}

/** Updates the given fields; metadata keys merge, as the provider does. */
export function updateCustomer(ledger: Ledger, id: string, params: CustomerParams): CustomerObject {
  const customer = getCustomer(ledger, id);
  if (params.email !== undefined) customer.email = params.email;
  if (params.name !== undefined) customer.name = params.name;
  if (params.description !== undefined) customer.description = params.description;
  if (params.phone !== undefined) customer.phone = params.phone;
  if (params.metadata !== undefined)
    customer.metadata = { ...customer.metadata, ...params.metadata };
  ledger.commit();
  return customer;
}

/** Customers newest first, optionally only those with an exact (case-sensitive) e-mail. */
export function listCustomers(
  ledger: Ledger,
  params: z.infer<typeof customerListSchema>,
): ListObject<CustomerObject> {
  const all = Object.values(ledger.state.customers)
    .filter((c) => params.email === undefined || c.email === params.email)
    .reverse();
  const limit = params.limit ?? 10;
  return {
    object: 'list',
    data: all.slice(0, limit),
    has_more: all.length > limit,
    url: '/v1/customers',
  };
}
