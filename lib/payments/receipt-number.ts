/** The number printed on a buyer's receipt and refund notice, e.g. WGR-000042 for order 42. */
export function receiptNumber(orderId: number): string {
  return `WGR-${String(orderId).padStart(6, '0')}`;
}
