"use client";

import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { LadderProgress } from "@/lib/validation/progress";

/** Best value per session on the current rung against the standard's line; pain sessions drawn in red. */
export function SessionChart({ ladder, unit }: { ladder: LadderProgress; unit: string }) {
  const points = ladder.sessions.filter((s) => s.rungId === ladder.current.rungId && s.best !== null);
  if (points.length === 0) {
    return <p className="text-sm text-muted">No sessions logged on this rung yet: the chart starts with the first one.</p>;
  }
  const target = ladder.standard?.minValue;
  return (
    <figure aria-label={`Best ${unit} per session on ${ladder.current.rungName}`}>
      <ResponsiveContainer width="100%" height={200}>
        <LineChart data={points} margin={{ top: 8, right: 12, bottom: 0, left: -16 }}>
          <CartesianGrid stroke="var(--line)" strokeDasharray="3 3" />
          <XAxis dataKey="date" tick={{ fontSize: 11, fill: "var(--muted)" }} />
          <YAxis tick={{ fontSize: 11, fill: "var(--muted)" }} domain={[0, (max: number) => Math.ceil(Math.max(max, target ?? 0) * 1.1)]} />
          <Tooltip formatter={(value) => [`${String(value)} ${unit}`, "Best"]} />
          {target !== undefined ? (
            <ReferenceLine y={target} stroke="var(--moss)" strokeDasharray="6 4" label={{ value: "Standard", fill: "var(--moss)", fontSize: 11, position: "insideTopRight" }} />
          ) : null}
          <Line
            type="monotone"
            dataKey="best"
            stroke="var(--ember)"
            strokeWidth={2}
            isAnimationActive={false}
            dot={(props: { cx?: number; cy?: number; index?: number; payload?: { pain: boolean } }) => (
              <circle
                key={props.index}
                cx={props.cx}
                cy={props.cy}
                r={props.payload?.pain ? 5 : 3}
                fill={props.payload?.pain ? "var(--danger)" : "var(--ember)"}
              />
            )}
          />
        </LineChart>
      </ResponsiveContainer>
      <figcaption className="mt-1 text-xs text-muted">Red points are sessions with a pain flag; they never count toward the standard.</figcaption>
    </figure>
  );
}
