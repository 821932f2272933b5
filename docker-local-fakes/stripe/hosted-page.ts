/** The fake's payment page: a card form where Stripe's test card numbers decide the outcome. */

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function paymentPage(input: { sessionId: string; description: string; amount: number; error?: string; cancelUrl: string | null }): string {
  const dollars = `$${(input.amount / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Pay ${dollars} — test payment page</title>
<style>body{font-family:system-ui,sans-serif;max-width:26rem;margin:2rem auto;padding:0 1rem;color:#222}
label{display:block;margin:.8rem 0 .2rem}input{width:100%;padding:.6rem;font-size:1rem;box-sizing:border-box}
button{margin-top:1.2rem;width:100%;padding:.8rem;font-size:1.05rem;background:#2d5a27;color:#fff;border:0;border-radius:6px}
.note{font-size:.85rem;color:#555}.error{color:#a00;font-weight:600}</style></head><body>
<p class="note">Local test payment page — no real money moves.</p>
<h1>Pay ${dollars}</h1><p>${escape(input.description)}</p>
${input.error ? `<p class="error" role="alert">${escape(input.error)}</p>` : ''}
<form method="post" action="/fake/pay/${escape(input.sessionId)}">
<label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="cc-number" required>
<label for="exp">Expiry (MM/YY)</label><input id="exp" name="exp" value="12/34">
<label for="cvc">CVC</label><input id="cvc" name="cvc" value="123">
<button type="submit">Pay ${dollars}</button></form>
<p class="note">4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined.</p>
${input.cancelUrl ? `<p><a href="${escape(input.cancelUrl)}">Back without paying</a></p>` : ''}
</body></html>`;
}

export function closedPage(message: string, backUrl: string | null): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Payment closed</title></head><body style="font-family:system-ui;max-width:26rem;margin:2rem auto">
<h1>Payment closed</h1><p role="alert">${escape(message)}</p>${backUrl ? `<p><a href="${escape(backUrl)}">Back to the shop</a></p>` : ''}</body></html>`;
}
