import type { ReactNode } from 'react';

/** The signed-out frame: the brand and one card. */
export function AuthLayout({ title, children }: { title: string; children: ReactNode }) {
  return (
    <main className="flex min-h-screen items-center justify-center bg-gradient-to-b from-dusk-950 via-dusk-900 to-dusk-800 px-4 py-10">
      <div className="w-full max-w-sm">
        <p className="mb-1 text-2xl font-semibold text-ember-300">Duskhaul</p>
        <p className="mb-6 text-dusk-300">Colonies, yards, growers and night moves in one place.</p>
        <div className="rounded-xl bg-dusk-850 p-6 shadow-xl ring-1 ring-dusk-700">
          <h1 className="mb-4 text-xl font-semibold text-dusk-50">{title}</h1>
          {children}
        </div>
      </div>
    </main>
  );
}
