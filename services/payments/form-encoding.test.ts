import { describe, expect, it } from 'vitest';
import { formListToArray, FormEncodingError, parseFormEncoded } from './form-encoding';

describe('parseFormEncoded', () => {
  it.each([
    ['a=1&b=two', { a: '1', b: 'two' }],
    ['metadata[reportId]=12&metadata[buyerId]=7', { metadata: { reportId: '12', buyerId: '7' } }],
    [
      'line_items[0][price_data][currency]=eur&line_items[0][quantity]=1',
      { line_items: { '0': { price_data: { currency: 'eur' }, quantity: '1' } } },
    ],
    ['expand[]=payment_intent&expand[]=line_items', { expand: { '0': 'payment_intent', '1': 'line_items' } }],
    ['line_items%5B0%5D%5Bquantity%5D=2', { line_items: { '0': { quantity: '2' } } }],
    ['success_url=http%3A%2F%2Flocalhost%2Fok%3Fs%3D%7BCHECKOUT_SESSION_ID%7D', { success_url: 'http://localhost/ok?s={CHECKOUT_SESSION_ID}' }],
  ])('reads %s', (body, expected) => {
    expect(parseFormEncoded(body)).toEqual(expected);
  });

  it.each(['__proto__[polluted]=1', 'a[constructor][x]=1', 'a]=1', 'a=1&a[b]=2'])('rejects %s', (body) => {
    expect(() => parseFormEncoded(body)).toThrow(FormEncodingError);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('formListToArray', () => {
  it('orders indexed entries numerically', () => {
    expect(formListToArray({ '10': 'k', '2': 'c', '0': 'a' })).toEqual(['a', 'c', 'k']);
  });

  it('leaves hashes with named keys alone', () => {
    expect(formListToArray({ reportId: '12' })).toEqual({ reportId: '12' });
  });
});
