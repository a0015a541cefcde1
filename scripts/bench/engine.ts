/**
 * Time per verdict of the pure readiness engine over 100,000 synthetic evaluations (goal: median
 * under 5 µs). Inputs are generated first, from a fixed seed, so only evaluate() is timed; calls are
 * timed in batches of 100 to keep the clock's own cost out of the figure.
 *
 *   npx tsx scripts/bench/engine.ts [--json]
 */
import { defaultStandard, evaluate, MEASURES, type EvaluationInput, type Measure, type Session } from "../../lib/engine";

const EVALUATIONS = 100_000;
const BATCH = 100;
const GOAL_MEDIAN_US = 5;

/** mulberry32: a small deterministic generator, so every run times the same inputs. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function date(dayOffset: number): string {
  return new Date(Date.UTC(2026, 2, 1) + dayOffset * 86_400_000).toISOString().slice(0, 10);
}

function syntheticInput(next: () => number): EvaluationInput {
  const measure = MEASURES[Math.floor(next() * MEASURES.length)] as Measure;
  const standard = defaultStandard(measure);
  const count = 1 + Math.floor(next() * 8);
  const sessions: Session[] = [];
  for (let i = 0; i < count; i += 1) {
    const sets = Array.from({ length: 3 }, () => {
      const value = standard.minValue * (0.6 + next() * 0.6);
      return measure.endsWith("each_side")
        ? { left: value, right: value * (0.9 + next() * 0.2), rpe: 5 + Math.floor(next() * 5) }
        : { value, reps: standard.minReps ?? undefined, rpe: 5 + Math.floor(next() * 5) };
    });
    sessions.push({ date: date(2 + i * 2), sets, pain: next() < 0.1 });
  }
  return {
    measure,
    standard,
    sessions,
    since: date(0),
    asOf: new Date(Date.UTC(2026, 2, 20, 10)),
    timeZone: "Europe/Amsterdam",
    prerequisites: next() < 0.3 ? [{ rungId: "p", ladderName: "Press", rungName: "Rung 4", reached: next() < 0.5 }] : [],
  };
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] as number;
}

function main(): void {
  const next = random(20260301);
  const inputs = Array.from({ length: EVALUATIONS }, () => syntheticInput(next));
  // Warm-up so the JIT has compiled evaluate() before timing.
  for (let i = 0; i < 20_000; i += 1) evaluate(inputs[i % inputs.length] as EvaluationInput);

  const perVerdictUs: number[] = [];
  let met = 0;
  const started = process.hrtime.bigint();
  for (let start = 0; start < EVALUATIONS; start += BATCH) {
    const t0 = process.hrtime.bigint();
    for (let i = start; i < start + BATCH; i += 1) if (evaluate(inputs[i] as EvaluationInput).status === "met") met += 1;
    perVerdictUs.push(Number(process.hrtime.bigint() - t0) / 1000 / BATCH);
  }
  const totalMs = Number(process.hrtime.bigint() - started) / 1e6;
  perVerdictUs.sort((a, b) => a - b);
  const result = {
    benchmark: "engine.evaluate",
    evaluations: EVALUATIONS,
    medianUs: percentile(perVerdictUs, 50),
    p95Us: percentile(perVerdictUs, 95),
    meanUs: (totalMs * 1000) / EVALUATIONS,
    totalMs,
    metShare: met / EVALUATIONS,
    goalMedianUs: GOAL_MEDIAN_US,
  };
  const ok = result.medianUs < GOAL_MEDIAN_US;
  if (process.argv.includes("--json")) {
    console.log(JSON.stringify({ ...result, ok }));
  } else {
    console.log(`engine.evaluate: ${EVALUATIONS.toLocaleString("en")} synthetic verdicts in ${totalMs.toFixed(0)} ms`);
    console.log(`  per verdict: median ${result.medianUs.toFixed(2)} µs, p95 ${result.p95Us.toFixed(2)} µs, mean ${result.meanUs.toFixed(2)} µs`);
    console.log(`  goal: median under ${GOAL_MEDIAN_US} µs — ${ok ? "met" : "MISSED"}`);
  }
  process.exitCode = ok ? 0 : 1;
}

main();
