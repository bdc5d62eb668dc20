import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import { PageHeader, Section } from '@/components/ui/page-header';
import { getReceivablesQueryOptions } from '@/features/receivables/api/get-receivables';
import { ExportLinks } from '@/features/receivables/components/export-links';
import { ReceivablesTable } from '@/features/receivables/components/receivables-table';
import { RevenueByCrop } from '@/features/receivables/components/revenue-by-crop';
import type { ReceivablesQuery } from '@/features/receivables/types';
import { cropName } from '@/lib/crops';
import { requireRole } from '@/lib/route-guards';
import { formatDate, formatDollars } from '@/lib/units';
import type { CropKey } from '@shared/schemas/sites';

function queryFrom(params: URLSearchParams): ReceivablesQuery {
  const season = Number(params.get('season'));
  return Number.isInteger(season) && season >= 2000 && season <= 2100 ? { season } : {};
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner']);
    await queryClient.ensureQueryData(
      getReceivablesQueryOptions(queryFrom(new URL(request.url).searchParams)),
    );
    return null;
  };

/** /receivables: what growers owe and for how long; the season's revenue by crop (owner). */
export function ReceivablesRoute() {
  const [params, setParams] = useSearchParams();
  const query = queryFrom(params);
  const { data } = useSuspenseQuery(getReceivablesQueryOptions(query));
  const thisYear = new Date().getFullYear();
  const seasons = [thisYear + 1, thisYear, thisYear - 1, thisYear - 2];
  if (!seasons.includes(data.season)) seasons.push(data.season);

  return (
    <>
      <PageHeader
        title="Receivables"
        description={`${formatDollars(data.totals.owedCents)} owed on sent invoices, aged as of ${formatDate(data.asOf)}.`}
        actions={<ExportLinks />}
      />
      <div className="flex flex-col gap-6">
        <Section title="Owed by grower">
          <ReceivablesTable receivables={data} />
        </Section>
        <Section
          title={`Revenue by crop, ${data.season}`}
          actions={
            <Field label="Season" className="w-36">
              <Select
                value={data.season}
                onChange={(e) => setParams({ season: e.target.value }, { replace: true })}
              >
                {seasons
                  .sort((a, b) => b - a)
                  .map((s) => (
                    <option key={s} value={s}>
                      {s}
                    </option>
                  ))}
              </Select>
            </Field>
          }
        >
          <RevenueByCrop receivables={data} cropName={(crop) => cropName(crop as CropKey)} />
        </Section>
      </div>
    </>
  );
}
