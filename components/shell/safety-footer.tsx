/** Shown on every training page. */
export function SafetyFooter() {
  return (
    <footer className="mx-auto mt-12 max-w-5xl px-4 pb-28 text-center text-xs text-muted sm:pb-8">
      Warm up first, use a wall or a spotter for new inversions, and stop on sharp pain. Rungwise does not replace a
      qualified coach, physiotherapist or physician.
    </footer>
  );
}
