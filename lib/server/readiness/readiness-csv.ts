import "server-only";
import { READINESS_CSV_COLUMNS, type ReadinessRow } from "@/lib/validation/readiness";

/** RFC 4180: quote a field holding a comma, quote, CR or LF, doubling inner quotes. */
export function csvField(value: string | number | boolean | null): string {
  if (value === null) return "";
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * Names typed by people may start with a spreadsheet formula sign; a leading apostrophe keeps a
 * spreadsheet from running them (OWASP "CSV injection").
 */
function safeText(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

function line(values: (string | number | boolean | null)[]): string {
  return values.map(csvField).join(",");
}

/** One line per athlete × ladder (an athlete on no ladder gets one line with empty ladder fields), CRLF line ends. */
export function readinessCsv(week: string, rows: ReadinessRow[]): string {
  const lines = [line([...READINESS_CSV_COLUMNS])];
  for (const row of rows) {
    const athlete = [week, row.athleteId, safeText(row.athleteName)];
    if (row.ladders.length === 0) lines.push(line([...athlete, null, null, null, null, null, null, null, null, null, null, null]));
    for (const cell of row.ladders) {
      lines.push(
        line([
          ...athlete,
          cell.ladderId,
          safeText(cell.ladderName),
          cell.rungId,
          safeText(cell.rungName),
          cell.readiness,
          cell.status,
          cell.sessionsThisWeek,
          cell.daysOnRung,
          cell.pain,
          cell.pendingPromotionId,
          cell.promotionsThisWeek,
        ]),
      );
    }
  }
  return `${lines.join("\r\n")}\r\n`;
}

export function csvResponse(filename: string, body: string): Response {
  return new Response(body, {
    status: 200,
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "no-store",
    },
  });
}
