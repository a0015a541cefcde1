"use client";

import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { Card } from "@/components/ui/card";
import type { LoadDto } from "@/lib/validation/load";

const fmt = (value: number | null, digits = 2) => (value === null ? "—" : value.toFixed(digits));

/** Daily load chart, weekly table and acute:chronic figures: descriptive only. */
export function LoadPanel({ load }: { load: LoadDto }) {
  const { acwr } = load;
  const hasLoad = load.days.some((d) => d.load > 0);
  const missing = Math.max(0, acwr.minDaysOfHistory - acwr.daysOfHistory);
  return (
    <Card className="flex flex-col gap-4">
      <header>
        <h2 className="font-display text-xl font-semibold">Training load</h2>
        <p className="text-sm text-muted">
          Descriptive figures only: they show how much and how evenly training was done, and do not predict injury.
        </p>
      </header>
      {hasLoad ? (
        <figure aria-label="Daily load">
          <ResponsiveContainer width="100%" height={160}>
            <BarChart data={load.days} margin={{ top: 4, right: 8, bottom: 0, left: -16 }}>
              <CartesianGrid stroke="var(--line)" strokeDasharray="3 3" vertical={false} />
              <XAxis dataKey="date" tick={{ fontSize: 10, fill: "var(--muted)" }} />
              <YAxis tick={{ fontSize: 10, fill: "var(--muted)" }} />
              <Tooltip formatter={(value) => [`${String(value)} AU`, "Load"]} />
              <Bar dataKey="load" fill="var(--sky)" isAnimationActive={false} />
            </BarChart>
          </ResponsiveContainer>
          <figcaption className="text-xs text-muted">
            Session load = session RPE × minutes (Foster et al. 2001), summed per day, {load.from} to {load.to}.
          </figcaption>
        </figure>
      ) : (
        <p className="text-sm text-muted">No session RPE and duration logged in this period, so there is no load to show.</p>
      )}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-muted">
            <tr>
              <th className="py-1">ISO week</th>
              <th>Load (AU)</th>
              <th>Monotony</th>
              <th>Strain</th>
            </tr>
          </thead>
          <tbody>
            {load.weeks.map((w) => (
              <tr key={w.week} className="border-t border-line">
                <td className="py-1">
                  {w.week}
                  {w.complete ? "" : " (so far)"}
                </td>
                <td className="tabular-nums">{Math.round(w.load)}</td>
                <td className="tabular-nums">{fmt(w.monotony)}</td>
                <td className="tabular-nums">{fmt(w.strain, 0)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-1 text-xs text-muted">
          Monotony = mean daily load ÷ standard deviation over the week&apos;s 7 days, using the population SD; strain = weekly load ×
          monotony (Foster 1998). A week with the same load every day has no monotony figure.
        </p>
      </div>
      <section className="text-sm">
        <h3 className="font-semibold">Acute:chronic ratio on {load.to}</h3>
        {missing > 0 ? (
          <p className="text-muted">
            Ratios appear after {acwr.minDaysOfHistory} days of logged history; {acwr.daysOfHistory} so far ({missing} to go).
          </p>
        ) : (
          <dl className="mt-1 grid grid-cols-2 gap-x-4 gap-y-1">
            <dt className="text-muted">Rolling 7/28 days, coupled</dt>
            <dd className="tabular-nums">{fmt(acwr.rolling?.coupled ?? null)}</dd>
            <dt className="text-muted">Rolling, uncoupled</dt>
            <dd className="tabular-nums">{fmt(acwr.rolling?.uncoupled ?? null)}</dd>
            <dt className="text-muted">EWMA (7 / 28 days)</dt>
            <dd className="tabular-nums">{fmt(acwr.ewma?.ratio ?? null)}</dd>
          </dl>
        )}
        <p className="mt-1 text-xs text-muted">
          Rolling: Hulin et al. 2014; exponentially weighted: Williams et al. 2017. They describe recent load against the longer run.
        </p>
      </section>
    </Card>
  );
}
