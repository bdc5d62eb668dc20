import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { requireUser } from '@/lib/route-guards';

/** /: each role starts on its own first screen. */
export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(queryClient, request);
    // The map is the staff's home screen (DESIGN.md).
    throw redirect(user.role === 'grower' ? paths.yourContracts : paths.atlas);
  };
