/**
 * The fake payment API's pieces that are not the API itself: reading the
 * SDK's form-encoded bodies, and the plain hosted checkout page (our own
 * words and look) with its Pay and Cancel buttons. Used by payments.mjs.
 */

/** `a[b][0][c]=1` → { a: { b: [ { c: "1" } ] } }: the SDK's form encoding read back. */
export function parseForm(text) {
  const out = {};
  for (const [rawKey, value] of new URLSearchParams(text)) {
    const parts = rawKey.replace(/\]/g, "").split("[");
    let node = out;
    parts.forEach((part, i) => {
      const last = i === parts.length - 1;
      const nextIsIndex = !last && /^\d+$/.test(parts[i + 1]);
      if (last) node[part] = value;
      else node = node[part] ??= nextIsIndex ? [] : {};
    });
  }
  return out;
}

export function money(minor, currency) {
  try {
    return new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(minor / 100);
  } catch {
    return `${(minor / 100).toFixed(2)} ${currency.toUpperCase()}`;
  }
}

const escapeHtml = (s) => String(s).replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]);

export function payPage(session, notice) {
  const item = session.line_items[0];
  const total = money(session.amount_total, session.currency);
  const open = session.status === "open";
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Test payment · ${escapeHtml(item.name)}</title>
<style>
  body { font: 16px/1.5 system-ui, sans-serif; background: #eef0ea; color: #222; margin: 0; }
  main { max-width: 28rem; margin: 3rem auto; background: #fff; border: 1px solid #ccd; border-radius: 10px; padding: 1.5rem; }
  .tag { display: inline-block; font-size: 12px; letter-spacing: .08em; text-transform: uppercase; background: #333; color: #fff; padding: 2px 8px; border-radius: 4px; }
  dl { display: grid; grid-template-columns: auto 1fr; gap: .25rem 1rem; } dt { color: #667; } dd { margin: 0; }
  .total { font-size: 1.6rem; font-weight: 700; margin: .5rem 0 1rem; }
  form { display: inline; } button { font: inherit; padding: .6rem 1.1rem; border-radius: 6px; border: 1px solid #556; cursor: pointer; }
  .pay { background: #2e6b4f; color: #fff; border-color: #2e6b4f; } .note { font-size: 13px; color: #667; }
</style></head>
<body><main>
  <span class="tag">Local test payment</span>
  <h1>${escapeHtml(item.name)}</h1>
  <p class="total" data-testid="fake-total">${escapeHtml(total)}</p>
  <dl>
    <dt>Buyer</dt><dd>${escapeHtml(session.customer_email ?? "—")}</dd>
    <dt>Reference</dt><dd><code>${escapeHtml(session.id)}</code></dd>
  </dl>
  ${notice ? `<p role="status">${escapeHtml(notice)}</p>` : ""}
  ${
    open
      ? `<form method="post" action="/pay/${session.id}/confirm"><button class="pay" type="submit">Pay ${escapeHtml(total)}</button></form>
  <form method="post" action="/pay/${session.id}/cancel"><button type="submit">Cancel</button></form>`
      : `<p>This checkout is ${escapeHtml(session.status)}.</p>`
  }
  <p class="note">This page stands in for the payment provider on this machine. No card is asked for and no money moves.</p>
</main></body></html>`;
}
