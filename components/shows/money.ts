// Integer cents shown as money ("$25.00"), without passing through a float.
const formatters = new Map<string, Intl.NumberFormat>();

export function formatCents(cents: number, currency = "usd"): string {
  const code = currency.toUpperCase();
  let f = formatters.get(code);
  if (!f) {
    f = new Intl.NumberFormat("en-US", { style: "currency", currency: code });
    formatters.set(code, f);
  }
  const sign = cents < 0 ? "-" : "";
  const abs = Math.abs(cents);
  // Intl formats a decimal string exactly (ECMA-402 "StringNumericLiteral").
  return f.format(`${sign}${Math.trunc(abs / 100)}.${String(abs % 100).padStart(2, "0")}` as `${number}`);
}
