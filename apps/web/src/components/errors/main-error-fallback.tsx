/** Last resort when the app itself fails to render: no router, no query client assumed. */
export function MainErrorFallback() {
  return (
    <div role="alert" className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-xl font-semibold">Polecourt could not start this page</h1>
      <p className="mt-2 text-ink-muted">Reload the page. If it keeps failing, tell your administrator what you were doing.</p>
      <button type="button" className="mt-4 rounded border border-rule-strong bg-paper-raised px-4 py-2 text-sm" onClick={() => window.location.reload()}>
        Reload
      </button>
    </div>
  );
}
