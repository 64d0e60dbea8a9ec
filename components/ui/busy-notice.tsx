/**
 * A page whose figures are computed in the compute pool, shown when the pool refused or stopped
 * the work: the pool's own message says why and when to try again. A server component.
 */
export function BusyNotice({ title, message }: { title: string; message: string }) {
  return (
    <div role="alert" className="mx-auto max-w-md space-y-4 py-12 text-center">
      <h1 className="font-display text-2xl font-semibold">{title}</h1>
      <p className="text-sm text-ink-soft" data-testid="busy-message">
        {message}
      </p>
      <p className="text-sm text-ink-soft">Nothing saved is affected; reload the page to retry.</p>
    </div>
  );
}
