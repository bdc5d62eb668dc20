import type { ReactNode } from 'react';

/** A screen's title, a line about it, and its main actions. */
export function PageHeader({
  title,
  description,
  actions,
  back,
}: {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
  back?: ReactNode;
}) {
  return (
    <header className="mb-6 flex flex-col gap-3">
      {back}
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight text-dusk-50 sm:text-3xl">
            {title}
          </h1>
          {description && <p className="mt-1 text-dusk-300">{description}</p>}
        </div>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </div>
    </header>
  );
}

/** A titled block inside a page. */
export function Section({
  title,
  actions,
  children,
}: {
  title: string;
  actions?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section className="rounded-lg bg-dusk-850 p-4 ring-1 ring-dusk-700 sm:p-5" aria-label={title}>
      <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-semibold text-dusk-50">{title}</h2>
        {actions}
      </div>
      {children}
    </section>
  );
}

/** A definition list of label/value pairs. */
export function Facts({ items }: { items: Array<[string, ReactNode]> }) {
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-3 sm:grid-cols-2">
      {items.map(([label, value]) => (
        <div key={label}>
          <dt className="text-sm text-dusk-300">{label}</dt>
          <dd className="text-dusk-50">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
