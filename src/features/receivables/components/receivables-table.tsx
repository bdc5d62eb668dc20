import { Link } from 'react-router-dom';
import type { AgeBucket } from '@shared/schemas/invoices';
import { paths } from '@/config/paths';
import { formatDollars } from '@/lib/units';
import type { Receivables } from '../types';

const bucketLabel: Record<AgeBucket, string> = {
  current: 'Current',
  '1-30': '1–30 days',
  '31-60': '31–60 days',
  '61-90': '61–90 days',
  '90+': 'Over 90 days',
};

const money = (cents: number) => (cents === 0 ? '—' : formatDollars(cents));

/** Owed by grower, split by how many days past due; totals at the foot. */
export function ReceivablesTable({ receivables }: { receivables: Receivables }) {
  const { buckets, byGrower, totals } = receivables;
  if (byGrower.length === 0)
    return <p className="text-dusk-300">Nothing is owed: every sent invoice is paid.</p>;
  return (
    <div className="overflow-x-auto rounded-lg ring-1 ring-dusk-700">
      <table className="w-full border-collapse text-left text-sm sm:text-base">
        <caption className="sr-only">Owed by grower and age</caption>
        <thead className="bg-dusk-800 text-dusk-200">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Grower
            </th>
            {buckets.map((b) => (
              <th
                key={b}
                scope="col"
                className="px-3 py-2 text-right font-medium whitespace-nowrap"
              >
                {bucketLabel[b]}
              </th>
            ))}
            <th scope="col" className="px-3 py-2 text-right font-medium">
              Owed
            </th>
          </tr>
        </thead>
        <tbody>
          {byGrower.map((g) => (
            <tr key={g.growerId} className="border-t border-dusk-700 bg-dusk-850">
              <th scope="row" className="px-3 py-2 font-normal">
                <Link to={`${paths.invoices}?status=sent&growerId=${g.growerId}`}>
                  {g.growerName}
                </Link>
              </th>
              {buckets.map((b) => (
                <td
                  key={b}
                  className={
                    b === 'current' || g.buckets[b] === 0
                      ? 'px-3 py-2 text-right tabular-nums'
                      : 'px-3 py-2 text-right text-rosehip-300 tabular-nums'
                  }
                >
                  {money(g.buckets[b])}
                </td>
              ))}
              <td className="px-3 py-2 text-right font-semibold tabular-nums">
                {formatDollars(g.owedCents)}
              </td>
            </tr>
          ))}
        </tbody>
        <tfoot className="bg-dusk-800">
          <tr className="border-t border-dusk-600">
            <th scope="row" className="px-3 py-2 font-semibold">
              All growers
            </th>
            {buckets.map((b) => (
              <td key={b} className="px-3 py-2 text-right font-semibold tabular-nums">
                {money(totals.buckets[b])}
              </td>
            ))}
            <td
              className="px-3 py-2 text-right font-semibold tabular-nums"
              data-testid="owed-total"
            >
              {formatDollars(totals.owedCents)}
            </td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
