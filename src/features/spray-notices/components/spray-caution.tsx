import { sprayCaution } from '@shared/schemas/spray-notices';
import { Alert } from '@/components/ui/alert';

/** The label-and-local-rules caution shown wherever spray notices are. */
export function SprayCaution({ caution = sprayCaution }: { caution?: string }) {
  return (
    <Alert tone="warning" title="Follow the product label and local rules">
      {caution}
    </Alert>
  );
}
