import type { ReactNode } from 'react';

/** What to show where a list is empty: what it is, and what to do next. */
export function EmptyState({
  title,
  children,
  action,
}: {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}) {
  return (
    <div className="flex flex-col items-start gap-3 rounded-lg border border-dashed border-dusk-500 bg-dusk-850 p-6">
      <h3 className="text-lg font-semibold text-dusk-50">{title}</h3>
      {children && <div className="text-dusk-200">{children}</div>}
      {action}
    </div>
  );
}
