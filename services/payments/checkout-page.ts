import { escapeHtml } from './http-io';
import { formatMinorAmount } from './money-format';
import type { CheckoutSession, LineItem } from './stripe-objects';

// The hosted page a buyer is sent to by `session.url`. It stands for the card form of a real
// payment page, so it stays deliberately plain: it must be obvious that no money moves here.

const STYLE = `
  :root { color-scheme: light; --ink: #1f2328; --muted: #5b636b; --line: #d8dde2; --paper: #f6f7f8;
          --accent: #2f5d8a; --accent-ink: #ffffff; }
  * { box-sizing: border-box; }
  body { margin: 0; background: var(--paper); color: var(--ink);
         font: 16px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; }
  main { max-width: 30rem; margin: 3rem auto; padding: 2rem; background: #fff;
         border: 1px solid var(--line); border-radius: 8px; }
  h1 { font-size: 1.35rem; margin: 0 0 .25rem; }
  .note { color: var(--muted); font-size: .9rem; margin: 0 0 1.5rem; }
  table { width: 100%; border-collapse: collapse; margin-bottom: 1rem; }
  td { padding: .4rem 0; border-bottom: 1px solid var(--line); vertical-align: top; }
  td.amount { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
  .total { display: flex; justify-content: space-between; font-size: 1.25rem; font-weight: 600;
           font-variant-numeric: tabular-nums; margin: 1rem 0 1.5rem; }
  dl { margin: 0 0 1.5rem; } dt { color: var(--muted); font-size: .85rem; } dd { margin: 0 0 .5rem; }
  label { display: block; color: var(--muted); font-size: .85rem; margin-bottom: .25rem; }
  input { width: 100%; font: inherit; padding: .6rem; border: 1px solid var(--line); border-radius: 6px;
          margin-bottom: 1.25rem; }
  .actions { display: flex; gap: .75rem; }
  button { font: inherit; min-height: 44px; padding: .6rem 1.4rem; border-radius: 6px; cursor: pointer; }
  button.primary { background: var(--accent); color: var(--accent-ink); border: 1px solid var(--accent); flex: 1; }
  button.secondary { background: #fff; color: var(--ink); border: 1px solid var(--line); }
  button:focus-visible, input:focus-visible { outline: 3px solid #8fb3d9; outline-offset: 2px; }
  .status { padding: .75rem 1rem; border: 1px solid var(--line); border-radius: 6px; background: var(--paper); }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
${body}
</main>
</body>
</html>`;
}

function lineItemRows(lineItems: readonly LineItem[]): string {
  return lineItems
    .map((item) => {
      const quantity = item.quantity > 1 ? ` × ${item.quantity}` : '';
      return `<tr><td>${escapeHtml(item.description)}${quantity}</td><td class="amount">${escapeHtml(
        formatMinorAmount(item.amount_total, item.currency),
      )}</td></tr>`;
    })
    .join('\n');
}

export function renderCheckoutPage(session: CheckoutSession, lineItems: readonly LineItem[]): string {
  const total = formatMinorAmount(session.amount_total, session.currency);
  const payAction = `/checkout/${encodeURIComponent(session.id)}/pay`;
  const cancelAction = `/checkout/${encodeURIComponent(session.id)}/cancel`;
  // Without a customer_email on the session the buyer types one, as on a real payment page.
  const emailField = session.customer_email
    ? `<dl><dt>Buyer e-mail</dt><dd id="buyer-email">${escapeHtml(session.customer_email)}</dd></dl>`
    : `<label for="email">Buyer e-mail</label><input id="email" name="email" type="email" required autocomplete="email">`;
  return layout(
    'Test payment',
    `<h1>Test payment</h1>
<p class="note">A local payment page for development and tests. No card is charged.</p>
<table aria-label="Items">
${lineItemRows(lineItems)}
</table>
<div class="total"><span>Total</span><span id="amount-total">${escapeHtml(total)}</span></div>
<form id="pay-form" method="post" action="${payAction}">
${emailField}
<div class="actions">
<button id="pay" class="primary" type="submit">Pay</button>
<button id="cancel" class="secondary" type="submit" form="cancel-form">Cancel</button>
</div>
</form>
<form id="cancel-form" method="post" action="${cancelAction}"></form>`,
  );
}

const CLOSED_SESSION_MESSAGES: Record<CheckoutSession['status'], string> = {
  open: 'This payment is still open.',
  complete: 'This payment has already been made.',
  expired: 'This payment link has expired. Return to the shop and start again.',
};

export function renderClosedSessionPage(session: CheckoutSession): string {
  return layout(
    'Test payment',
    `<h1>Test payment</h1>
<p class="status" role="status">${escapeHtml(CLOSED_SESSION_MESSAGES[session.status])}</p>`,
  );
}

export function renderCancelledPage(): string {
  return layout('Test payment', `<h1>Test payment</h1><p class="status" role="status">Payment cancelled.</p>`);
}

export function renderUnknownSessionPage(): string {
  return layout('Test payment', `<h1>Test payment</h1><p class="status" role="status">No such payment.</p>`);
}
