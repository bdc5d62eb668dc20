import { useState } from 'react';
import { proposalCounterRequest } from '@shared/schemas/proposals';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Input, Textarea } from '@/components/ui/input';
import { ApiError } from '@/lib/api-client';
import { formatCount, formatDate } from '@/lib/units';
import { useAnswerProposal, type ProposalAnswer } from '../api/answer-proposal';
import type { Proposal } from '../types';

type CounterErrors = Partial<Record<'deliveryStartOn' | 'deliveryEndOn' | 'colonies', string>>;

/** What went wrong with an answer, in the grower's words. */
function answerFailure(error: unknown): string {
  if (error instanceof ApiError && error.status === 409)
    return 'This proposal was already answered or replaced by a newer one. The page now shows where it stands.';
  if (error instanceof ApiError) return error.message;
  return 'Something went wrong. Try again.';
}

interface PendingProposalProps {
  proposal: Proposal;
  operationName: string;
  /** Refreshes the contracts after an answer (the portal does not own them). */
  onAnswered?: () => void;
}

/** A proposed delivery window waiting for the grower: confirm, decline or propose another. */
export function PendingProposal({ proposal, operationName, onAnswered }: PendingProposalProps) {
  const answer = useAnswerProposal(onAnswered);
  const [note, setNote] = useState('');
  const [countering, setCountering] = useState(false);
  const [counter, setCounter] = useState({
    deliveryStartOn: proposal.deliveryStartOn,
    deliveryEndOn: proposal.deliveryEndOn,
    colonies: '',
  });
  const [counterErrors, setCounterErrors] = useState<CounterErrors>({});

  const send = (reply: ProposalAnswer) => answer.mutate({ id: proposal.id, answer: reply });
  const trimmedNote = note.trim();
  const withNote = trimmedNote ? { note: trimmedNote } : {};

  const sendCounter = (event: React.FormEvent) => {
    event.preventDefault();
    const colonies = counter.colonies.trim();
    const request = {
      deliveryStartOn: counter.deliveryStartOn,
      deliveryEndOn: counter.deliveryEndOn,
      ...(colonies ? { colonies: Number(colonies) } : {}),
      ...withNote,
    };
    const parsed = proposalCounterRequest.safeParse(request);
    if (!parsed.success) {
      const errors: CounterErrors = {};
      for (const issue of parsed.error.issues) {
        const field = String(issue.path[0]) as keyof CounterErrors;
        errors[field] ??=
          field === 'colonies' ? 'Enter a whole number of colonies.' : issue.message;
      }
      if (!counter.deliveryStartOn) errors.deliveryStartOn = 'Choose a date.';
      if (!counter.deliveryEndOn) errors.deliveryEndOn = 'Choose a date.';
      setCounterErrors(errors);
      return;
    }
    setCounterErrors({});
    send({ kind: 'counter', ...parsed.data });
  };

  const busy = answer.isPending;
  return (
    <div
      className="flex flex-col gap-4 rounded-md border border-ember-600 bg-dusk-900 p-4"
      aria-label="Dates to confirm"
      role="group"
    >
      <div>
        <p className="text-sm text-ember-300">{operationName} proposes</p>
        <p className="text-lg font-semibold text-dusk-50">
          {formatDate(proposal.deliveryStartOn)} – {formatDate(proposal.deliveryEndOn)}
        </p>
        <p>{formatCount(proposal.colonies)} colonies</p>
        {proposal.note && <p className="mt-2 whitespace-pre-line text-dusk-200">{proposal.note}</p>}
      </div>
      {answer.error && <Alert title="Not sent.">{answerFailure(answer.error)}</Alert>}
      <Field label="Note to the beekeeper (optional)">
        <Textarea value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      </Field>
      {!countering ? (
        <div className="flex flex-wrap gap-2">
          <Button busy={busy} onClick={() => send({ kind: 'confirm', ...withNote })}>
            Confirm these dates
          </Button>
          <Button variant="secondary" disabled={busy} onClick={() => setCountering(true)}>
            Propose another window
          </Button>
          <Button
            variant="danger"
            disabled={busy}
            onClick={() => send({ kind: 'decline', ...withNote })}
          >
            Decline
          </Button>
        </div>
      ) : (
        <form
          onSubmit={sendCounter}
          noValidate
          aria-label="Propose another window"
          className="flex flex-col gap-3"
        >
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
            <Field label="First delivery day" error={counterErrors.deliveryStartOn}>
              <Input
                type="date"
                value={counter.deliveryStartOn}
                onChange={(e) => setCounter({ ...counter, deliveryStartOn: e.target.value })}
              />
            </Field>
            <Field label="Last delivery day" error={counterErrors.deliveryEndOn}>
              <Input
                type="date"
                value={counter.deliveryEndOn}
                onChange={(e) => setCounter({ ...counter, deliveryEndOn: e.target.value })}
              />
            </Field>
            <Field label="Colonies (optional)" error={counterErrors.colonies}>
              <Input
                inputMode="numeric"
                value={counter.colonies}
                onChange={(e) => setCounter({ ...counter, colonies: e.target.value })}
              />
            </Field>
          </div>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" busy={busy}>
              Send this window
            </Button>
            <Button variant="ghost" disabled={busy} onClick={() => setCountering(false)}>
              Back
            </Button>
          </div>
        </form>
      )}
    </div>
  );
}
