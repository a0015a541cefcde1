"use client";

import { useCallback, useState, type KeyboardEvent } from "react";

/**
 * Roving focus for a data grid: one cell is in the tab order; arrow keys move between cells, Home and
 * End jump to the row's first and last cell, Ctrl+Home / Ctrl+End to the first and last row, Enter
 * activates the cell's first link or button. Cells carry data-row and data-col.
 */
export function useGridKeys(rows: number, cols: number) {
  const [active, setActive] = useState<[number, number]>([0, 0]);
  const row = Math.min(active[0], Math.max(rows - 1, 0));
  const col = Math.min(active[1], Math.max(cols - 1, 0));

  const onKeyDown = useCallback(
    (event: KeyboardEvent<HTMLElement>) => {
      const cell = (event.target as HTMLElement).closest<HTMLElement>("[data-row][data-col]");
      if (!cell) return;
      let r = Number(cell.dataset.row);
      let c = Number(cell.dataset.col);
      switch (event.key) {
        case "ArrowUp": r -= 1; break;
        case "ArrowDown": r += 1; break;
        case "ArrowLeft": c -= 1; break;
        case "ArrowRight": c += 1; break;
        case "Home": c = 0; if (event.ctrlKey) r = 0; break;
        case "End": c = cols - 1; if (event.ctrlKey) r = rows - 1; break;
        case "Enter":
          if (event.target === cell) {
            cell.querySelector<HTMLElement>("a, button:not([disabled])")?.click();
            event.preventDefault();
          }
          return;
        default:
          return;
      }
      event.preventDefault();
      r = Math.max(0, Math.min(rows - 1, r));
      c = Math.max(0, Math.min(cols - 1, c));
      setActive([r, c]);
      const grid = cell.closest("[role=grid]");
      grid?.querySelector<HTMLElement>(`[data-row="${r}"][data-col="${c}"]`)?.focus();
    },
    [rows, cols],
  );

  /** Props for one cell: only the active cell is tabbable; focusing a cell makes it active. */
  const cellProps = (r: number, c: number) => ({
    "data-row": r,
    "data-col": c,
    tabIndex: r === row && c === col ? 0 : -1,
    onFocus: () => setActive([r, c]),
  });

  return { onKeyDown, cellProps };
}
