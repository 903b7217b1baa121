import type { ReactNode } from 'react';

/** The calm single-column frame for sign-in and e-mailed links. */
export function AuthLayout({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <main className="flex min-h-screen items-center justify-center bg-paper px-4 py-12 text-ink">
      <div className="w-full max-w-sm">
        <div className="mb-8 flex items-center gap-2.5">
          <img src="/favicon.svg" alt="" className="size-9" />
          <div>
            <p className="text-lg font-semibold leading-tight tracking-tight">Starproof</p>
            <p className="text-xs text-muted">Checked numbers for public pages about the sky</p>
          </div>
        </div>
        <div className="rounded-lg border border-rule bg-panel p-6 shadow-sm">
          <h1 className="text-xl font-semibold tracking-tight">{title}</h1>
          {intro && <div className="mt-1 text-sm text-muted">{intro}</div>}
          <div className="mt-5">{children}</div>
        </div>
      </div>
    </main>
  );
}
