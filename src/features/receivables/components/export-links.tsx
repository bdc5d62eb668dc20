import { buttonClasses } from '@/components/ui/button';

/** Spreadsheet downloads of every invoice and every payment (plain links: the cookie goes along). */
export function ExportLinks() {
  return (
    <div className="flex flex-wrap gap-2">
      <a href="/api/invoices/export.csv" download className={buttonClasses('secondary', 'sm')}>
        Download invoices (CSV)
      </a>
      <a href="/api/payments/export.csv" download className={buttonClasses('secondary', 'sm')}>
        Download payments (CSV)
      </a>
    </div>
  );
}
