import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProposalCounterRequest } from '@shared/schemas/proposals';
import { api } from '@/lib/api-client';
import type { Proposal } from '../types';
import { portalKeys } from './keys';

export type ProposalAnswer =
  | { kind: 'confirm'; note?: string }
  | { kind: 'decline'; note?: string }
  | ({ kind: 'counter' } & ProposalCounterRequest);

export const answerProposal = (id: string, { kind, ...body }: ProposalAnswer) =>
  api.post<{ proposal: Proposal; contract: { id: string; status: string } }>(
    `/api/proposals/${id}/${kind}`,
    body,
  );

/** Confirms, declines or counters a proposal; `onAnswered` refreshes what else it changes. */
export function useAnswerProposal(onAnswered?: () => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, answer }: { id: string; answer: ProposalAnswer }) =>
      answerProposal(id, answer),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: portalKeys.all });
      onAnswered?.();
    },
  });
}
