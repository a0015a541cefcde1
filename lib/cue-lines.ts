/** A rung's cues are written one per line (the rung form says so): the lines, trimmed, blanks dropped. */
export function cueLines(cues: string | null | undefined): string[] {
  return (cues ?? "")
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line.length > 0);
}
