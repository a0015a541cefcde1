// With BENCH_PGSS=1 the bench's cluster preloads pg_stat_statements; this prints where PostgreSQL
// spent its time over the whole run (planning and execution per statement), to see what to cut.
import pg from "pg";
import { printTable } from "./stats.mjs";

export async function printStatementStats(dbUrl, top = 15) {
  const client = new pg.Client({ connectionString: dbUrl });
  await client.connect();
  try {
    await client.query("create extension if not exists pg_stat_statements");
    const { rows } = await client.query(
      `select calls, round(total_plan_time::numeric, 0) as plan_ms, round(total_exec_time::numeric, 0) as exec_ms,
              round(((total_plan_time + total_exec_time) / greatest(calls, 1))::numeric, 3) as ms_per_call,
              left(regexp_replace(query, '\\s+', ' ', 'g'), 90) as statement
         from pg_stat_statements order by total_plan_time + total_exec_time desc limit $1`,
      [top],
    );
    console.log("\n[bench] PostgreSQL time by statement (pg_stat_statements)");
    printTable(rows.map((r) => ({ calls: r.calls, "plan ms": r.plan_ms, "exec ms": r.exec_ms, "ms/call": r.ms_per_call, statement: r.statement })));
  } finally {
    await client.end();
  }
}
