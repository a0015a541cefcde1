/**
 * An amount in a currency's minor unit (cents, öre; yen has none) as people read it. The number of
 * fraction digits comes from Intl, so JPY 1200 shows as ¥1,200 and EUR 1200 as €12.00.
 */
export function formatMoney(amountMinor: number, currency: string, locale?: string): string {
  const format = new Intl.NumberFormat(locale, { style: "currency", currency });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(amountMinor / 10 ** digits);
}
