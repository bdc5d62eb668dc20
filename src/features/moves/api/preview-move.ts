import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { MovePreviewRequest } from '@shared/schemas/moves';
import { api } from '@/lib/api-client';
import type { MovePlan } from '../types';
import { moveKeys } from './keys';

/** The live plan of a move being drafted; reads only (POST because the body is large). */
export const previewMove = (body: MovePreviewRequest) =>
  api.post<MovePlan>('/api/moves/preview', body);

export const previewMoveQueryOptions = (body: MovePreviewRequest) =>
  queryOptions({
    queryKey: moveKeys.preview(body),
    queryFn: () => previewMove(body),
    staleTime: 30_000,
    placeholderData: keepPreviousData,
  });

/** The plan for `body` (null while the inputs are not enough to plan); the last plan stays shown meanwhile. */
export const usePreviewMove = (body: MovePreviewRequest | null) =>
  useQuery({
    ...previewMoveQueryOptions(body ?? ({} as MovePreviewRequest)),
    enabled: body !== null,
  });
