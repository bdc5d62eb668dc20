import { useState } from 'react';
import { sprayActions, type SprayAction } from '@shared/schemas/spray-notices';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Input, Select } from '@/components/ui/input';
import { ApiError, isVersionConflict } from '@/lib/api-client';
import { useAcknowledgeSprayNotice } from '../api/acknowledge-spray-notice';
import type { SprayNotice } from '../types';
import { sprayActionLabels } from '../types';

/** Acknowledges one notice with the action taken and an internal note. */
export function AcknowledgeForm({ notice }: { notice: SprayNotice }) {
  const acknowledge = useAcknowledgeSprayNotice();
  const [action, setAction] = useState<SprayAction | ''>('');
  const [note, setNote] = useState('');
  const [missing, setMissing] = useState(false);

  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    if (!action) {
      setMissing(true);
      return;
    }
    setMissing(false);
    const trimmed = note.trim();
    acknowledge.mutate({
      id: notice.id,
      version: notice.version,
      action,
      ...(trimmed ? { note: trimmed } : {}),
    });
  };

  const error = acknowledge.error;
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Acknowledge ${notice.product}`}
      className="flex flex-col gap-2"
    >
      {isVersionConflict(error) && (
        <Alert tone="warning" title="Someone else answered this notice first.">
          The list now shows it as they left it. Check their action before changing anything.
        </Alert>
      )}
      {error && !isVersionConflict(error) && (
        <Alert title="Not acknowledged.">
          {error instanceof ApiError ? error.message : 'Something went wrong.'}
        </Alert>
      )}
      <Field label="Action" error={missing ? 'Choose what you will do.' : undefined}>
        <Select value={action} onChange={(e) => setAction(e.target.value as SprayAction | '')}>
          <option value="">Choose…</option>
          {sprayActions.map((a) => (
            <option key={a} value={a}>
              {sprayActionLabels[a]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Internal note" hint="Staff only; the grower sees the action, not this note.">
        <Input value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <div>
        <Button type="submit" size="sm" busy={acknowledge.isPending}>
          Acknowledge
        </Button>
      </div>
    </form>
  );
}
