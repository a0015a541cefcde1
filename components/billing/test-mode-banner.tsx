/** Shown whenever payments go to the development fake or a provider test key: no real money moves. */
export function TestModeBanner() {
  return (
    <p role="status" className="mb-4 rounded-lg bg-ember-soft px-4 py-2 text-sm font-semibold text-ember">
      Test mode: payments go to a development fake. No real money moves.
    </p>
  );
}
