import { describe, expect, it } from "vitest";
import { formatMoney } from "@/lib/client/format-money";
import { parseForm } from "@/scripts/dev-fakes/payments-fake.mjs";

describe("formatMoney", () => {
  // ISO 4217 minor units: EUR and GBP have 2 decimals, JPY none (the Intl data follows the standard).
  it.each([
    [4900, "EUR", "€49.00"],
    [1, "GBP", "£0.01"],
    [1200, "JPY", "¥1,200"],
    [1_000_000, "USD", "$10,000.00"],
  ])("%i %s reads %s", (amount, currency, expected) => {
    expect(formatMoney(amount, currency, "en-US")).toBe(expected);
  });
});

describe("the payments fake's form decoding", () => {
  it("reads nested keys and arrays the way the SDK encodes them", () => {
    const body = new URLSearchParams({
      mode: "subscription",
      "line_items[0][quantity]": "1",
      "line_items[0][price_data][currency]": "eur",
      "line_items[0][price_data][unit_amount]": "4900",
      "line_items[0][price_data][product_data][name]": "Monthly",
      "metadata[teamId]": "t1",
    }).toString();
    expect(parseForm(body)).toEqual({
      mode: "subscription",
      line_items: [{ quantity: "1", price_data: { currency: "eur", unit_amount: "4900", product_data: { name: "Monthly" } } }],
      metadata: { teamId: "t1" },
    });
  });
});
