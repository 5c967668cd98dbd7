// Rendered outside the router, so plain <a> links only.
export function AppErrorFallback() {
  return (
    <main role="alert" className="mx-auto flex min-h-dvh max-w-lg flex-col justify-center gap-4 px-6">
      <p className="text-label text-drab-700 uppercase">Drabyard</p>
      <h1 className="text-2xl font-bold text-ink">Something broke on this page</h1>
      <p className="text-ink-soft">Reload to try again. If it keeps happening, come back a little later.</p>
      <div className="flex gap-3">
        <button
          type="button"
          onClick={() => window.location.reload()}
          className="h-10 rounded-tag bg-patina-600 px-4 font-semibold text-white hover:bg-patina-700"
        >
          Reload
        </button>
        <a href="/" className="inline-flex h-10 items-center rounded-tag border border-rule-strong px-4 font-semibold text-ink hover:bg-paper-sunk">
          Home
        </a>
      </div>
    </main>
  );
}
