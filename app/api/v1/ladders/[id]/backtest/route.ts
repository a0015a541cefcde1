import { route } from "@/lib/server/http/route";
import { backtestRung } from "@/lib/server/promotions/backtest-rung";
import { ZBacktestRequest } from "@/lib/validation/backtest";

export const POST = route({ can: "ladders.backtest", body: ZBacktestRequest }, ({ actor, params, body }) =>
  backtestRung(actor, params.id!, body),
);
