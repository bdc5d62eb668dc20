import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ReceivablesTable } from '@/features/receivables/components/receivables-table';
import { ExportLinks } from '@/features/receivables/components/export-links';
import type { Receivables } from '@/features/receivables/types';
import { renderWithProviders } from './support';

const buckets = (current: number, d30: number, d60: number, d90: number, older: number) => ({
  current,
  '1-30': d30,
  '31-60': d60,
  '61-90': d90,
  '90+': older,
});

const receivables: Receivables = {
  asOf: '2027-05-01',
  season: 2027,
  buckets: ['current', '1-30', '31-60', '61-90', '90+'],
  byGrower: [
    {
      growerId: 'g1',
      growerName: 'Sunfold Almond Ranch',
      owedCents: 1_836_000,
      buckets: buckets(1_336_000, 500_000, 0, 0, 0),
    },
    {
      growerId: 'g2',
      growerName: 'Pellwick Family Farms',
      owedCents: 98_050,
      buckets: buckets(0, 0, 0, 0, 98_050),
    },
  ],
  totals: { owedCents: 1_934_050, buckets: buckets(1_336_000, 500_000, 0, 0, 98_050) },
  revenueByCrop: [],
};

describe('ReceivablesTable', () => {
  it('when growers owe then each row splits by age and the foot totals every bucket', () => {
    renderWithProviders(<ReceivablesTable receivables={receivables} />);
    const table = screen.getByRole('table', { name: 'Owed by grower and age' });
    const headers = within(table)
      .getAllByRole('columnheader')
      .map((h) => h.textContent);
    expect(headers).toEqual([
      'Grower',
      'Current',
      '1–30 days',
      '31–60 days',
      '61–90 days',
      'Over 90 days',
      'Owed',
    ]);
    const sunfold = within(table).getByRole('row', { name: /Sunfold/ });
    expect(
      within(sunfold)
        .getAllByRole('cell')
        .map((c) => c.textContent),
    ).toEqual(['$13,360.00', '$5,000.00', '—', '—', '—', '$18,360.00']);
    expect(screen.getByTestId('owed-total').textContent).toBe('$19,340.50');
    expect(within(sunfold).getByRole('link').getAttribute('href')).toBe(
      '/invoices?status=sent&growerId=g1',
    );
  });

  it('when nothing is owed then it says so instead of an empty table', () => {
    renderWithProviders(
      <ReceivablesTable
        receivables={{
          ...receivables,
          byGrower: [],
          totals: { owedCents: 0, buckets: buckets(0, 0, 0, 0, 0) },
        }}
      />,
    );
    expect(screen.queryByRole('table')).toBeNull();
    expect(screen.getByText(/Nothing is owed/)).toBeTruthy();
  });

  it('the CSV exports are plain download links to the API', () => {
    renderWithProviders(<ExportLinks />);
    const invoices = screen.getByRole('link', { name: 'Download invoices (CSV)' });
    expect(invoices.getAttribute('href')).toBe('/api/invoices/export.csv');
    expect(invoices.hasAttribute('download')).toBe(true);
    expect(screen.getByRole('link', { name: 'Download payments (CSV)' }).getAttribute('href')).toBe(
      '/api/payments/export.csv',
    );
  });
});
