import { z } from 'zod';
import { formListToArray } from './form-encoding';
import { invalidRequest, StripeApiError } from './stripe-error';

// Request schemas for the endpoints the stand-in serves. They are strict on purpose: Stripe
// answers an unknown parameter with 400 "Received unknown parameter", and so must we, or a typo
// in the app would pass locally and fail against Stripe.

const formInteger = z
  .string()
  .regex(/^-?\d+$/, 'Invalid integer')
  .transform(Number);

const formTimestamp = formInteger;

const formList = <T extends z.ZodType>(item: T) => z.preprocess(formListToArray, z.array(item));

const currencyCode = z
  .string()
  .regex(/^[a-zA-Z]{3}$/, 'Invalid currency')
  .transform((code) => code.toLowerCase())
  .refine((code) => Intl.supportedValuesOf('currency').includes(code.toUpperCase()), 'Invalid currency');

const absoluteUrl = z.string().refine((value) => URL.canParse(value), 'Not a valid URL');

// Stripe's documented limits: 50 keys, key up to 40 characters, value up to 500.
const metadata = z
  .record(z.string().max(40), z.string().max(500))
  .refine((value) => Object.keys(value).length <= 50, 'Metadata can have at most 50 keys');

const expand = formList(z.string()).optional();

const productData = z.strictObject({
  name: z.string().min(1),
  description: z.string().optional(),
  metadata: metadata.optional(),
});

const lineItem = z.strictObject({
  price_data: z.strictObject({
    currency: currencyCode,
    unit_amount: formInteger.pipe(z.number().int().min(0)),
    product_data: productData,
  }),
  quantity: formInteger.pipe(z.number().int().min(1)),
});

export const createCheckoutSessionParams = z.strictObject({
  mode: z.enum(['payment']),
  line_items: z.preprocess(formListToArray, z.array(lineItem).min(1)),
  success_url: absoluteUrl,
  cancel_url: absoluteUrl.optional(),
  customer_email: z.email().optional(),
  client_reference_id: z.string().max(200).optional(),
  metadata: metadata.optional(),
  expires_at: formTimestamp.optional(),
  locale: z.string().optional(),
  payment_method_types: formList(z.string()).optional(),
  submit_type: z.enum(['auto', 'book', 'donate', 'pay']).optional(),
  payment_intent_data: z
    .strictObject({
      description: z.string().optional(),
      metadata: metadata.optional(),
      receipt_email: z.email().optional(),
    })
    .optional(),
  expand,
});
export type CreateCheckoutSessionParams = z.output<typeof createCheckoutSessionParams>;

export const createRefundParams = z.strictObject({
  payment_intent: z.string().optional(),
  charge: z.string().optional(),
  amount: formInteger.pipe(z.number().int().min(1)).optional(),
  reason: z.enum(['duplicate', 'fraudulent', 'requested_by_customer']).optional(),
  metadata: metadata.optional(),
  expand,
});
export type CreateRefundParams = z.output<typeof createRefundParams>;

export const expandOnlyParams = z.strictObject({ expand });

/** Validates form params, turning the first problem into the error Stripe would return for it. */
export function parseParams<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input, { reportInput: true });
  if (result.success) return result.data;
  // Stripe names an unknown parameter before anything else wrong with the request.
  const issues = result.error.issues;
  throw toStripeError(issues.find((issue) => issue.code === 'unrecognized_keys') ?? issues[0]);
}

function toStripeError(issue: z.core.$ZodIssue | undefined): StripeApiError {
  if (!issue) return invalidRequest('Invalid request');
  const param = formatParam(issue.path);
  if (issue.code === 'unrecognized_keys') {
    const unknown = formatParam([...issue.path, issue.keys[0] ?? '']);
    return invalidRequest(`Received unknown parameter: ${unknown}`, { param: unknown, code: 'parameter_unknown' });
  }
  if (issue.code === 'invalid_type' && issue.input === undefined) {
    return invalidRequest(`Missing required param: ${param}.`, { param, code: 'parameter_missing' });
  }
  if (issue.code === 'too_small' && issue.origin === 'array' && Number(issue.minimum) === 1) {
    return invalidRequest(`Missing required param: ${param}.`, { param, code: 'parameter_missing' });
  }
  return invalidRequest(`Invalid ${param}: ${issue.message}`, { param, code: 'parameter_invalid' });
}

/** `['line_items', 0, 'quantity']` → `line_items[0][quantity]`, the way Stripe names params. */
function formatParam(path: PropertyKey[]): string {
  const [head, ...rest] = path.map(String);
  return `${head ?? ''}${rest.map((segment) => `[${segment}]`).join('')}`;
}
