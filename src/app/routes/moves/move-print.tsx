import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button } from '@/components/ui/button';
import { getLoadSheetQueryOptions } from '@/features/moves/api/get-load-sheet';
import { PrintableLoadSheet } from '@/features/moves/components/printable-load-sheet';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    await queryClient.ensureQueryData(getLoadSheetQueryOptions(params.moveId!));
    return null;
  };

/** /moves/:moveId/print: one sheet of paper per truck. */
export function MovePrintRoute() {
  const id = useParams().moveId!;
  const user = useUser();
  const { data: sheet } = useSuspenseQuery(getLoadSheetQueryOptions(id));
  return (
    <>
      <div className="load-sheet-screen-only mb-6 flex flex-wrap items-center justify-between gap-3">
        <div>
          <Link to={paths.move(id)}>← Back to the move</Link>
          <h1 className="mt-2 text-2xl font-semibold text-dusk-50">
            Load sheets: {sheet.move.name}
          </h1>
          <p className="text-dusk-300">
            {sheet.pages.length} truck{sheet.pages.length === 1 ? '' : 's'}, one page each.
          </p>
        </div>
        <Button onClick={() => window.print()}>Print</Button>
      </div>
      <PrintableLoadSheet sheet={sheet} units={user.units} />
    </>
  );
}
