import { Badge } from "@/components/ui/card";
import type { BacktestItem } from "@/lib/validation/backtest";

function daysApart(a: string, b: string): number {
  return Math.round((Date.parse(`${b}T00:00:00Z`) - Date.parse(`${a}T00:00:00Z`)) / 86_400_000);
}

function Difference({ actual, would }: { actual: string | null; would: string | null }) {
  if (!would) return <Badge>Not met</Badge>;
  if (!actual) return <Badge tone="sky">Still on the rung</Badge>;
  const days = daysApart(actual, would);
  if (days === 0) return <Badge>Same day</Badge>;
  return days < 0 ? <Badge tone="moss">{-days} d earlier</Badge> : <Badge tone="ember">{days} d later</Badge>;
}

const rowKey = (item: BacktestItem) => `${item.athleteId}-${item.reachedOn}`;

/** Every stint in its own row, one fact per column: for the what-if page's wide right-hand side. */
export function BacktestTable({ items }: { items: BacktestItem[] }) {
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">Replay of the proposed standard</caption>
      <thead className="text-xs uppercase tracking-wide text-muted">
        <tr>
          <th scope="col" className="py-2 pr-3">Athlete</th>
          <th scope="col" className="py-2 pr-3">Reached rung</th>
          <th scope="col" className="py-2 pr-3">Moved up</th>
          <th scope="col" className="py-2 pr-3">Would move up</th>
          <th scope="col" className="py-2">Change</th>
        </tr>
      </thead>
      <tbody>
        {items.map((item) => (
          <tr key={rowKey(item)} className="border-t border-line">
            <td className="py-2 pr-3 font-semibold">{item.athleteName}</td>
            <td className="py-2 pr-3 font-mono">{item.reachedOn}</td>
            <td className="py-2 pr-3 font-mono">{item.actualPromotedOn ?? "—"}</td>
            <td className="py-2 pr-3 font-mono">{item.wouldPromoteOn ?? "never, so far"}</td>
            <td className="py-2">
              <Difference actual={item.actualPromotedOn} would={item.wouldPromoteOn} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/**
 * The same facts in three columns, the start date under the name and the change under the replayed
 * date, so it fits a 375 px phone and the narrow column beside the standard fields.
 */
export function CompactBacktestTable({ items }: { items: BacktestItem[] }) {
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">Replay of the standard as typed</caption>
      <thead className="text-xs uppercase tracking-wide text-muted">
        <tr>
          <th scope="col" className="py-2 pr-3">Athlete</th>
          <th scope="col" className="py-2 pr-3">Moved up</th>
          <th scope="col" className="py-2">Under this standard</th>
        </tr>
      </thead>
      <tbody>
        {items.map((item) => (
          <tr key={rowKey(item)} className="border-t border-line align-top">
            <td className="py-2 pr-3">
              <span className="block font-semibold">{item.athleteName}</span>
              <span className="block text-xs text-muted">
                on it from <span className="whitespace-nowrap font-mono">{item.reachedOn}</span>
              </span>
            </td>
            <td className="whitespace-nowrap py-2 pr-3 font-mono">{item.actualPromotedOn ?? "—"}</td>
            <td className="py-2">
              <span className="block whitespace-nowrap font-mono">{item.wouldPromoteOn ?? "never, so far"}</span>
              <span className="block whitespace-nowrap">
                <Difference actual={item.actualPromotedOn} would={item.wouldPromoteOn} />
              </span>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
