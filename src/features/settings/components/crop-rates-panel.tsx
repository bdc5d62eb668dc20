import { Section } from '@/components/ui/page-header';
import { SimpleTable } from '@/components/ui/table';
import type { CropRate } from '../types';

/** Default colonies per acre by crop, with the published range and where it comes from. */
export function CropRatesPanel({ crops }: { crops: CropRate[] }) {
  return (
    <Section title="Crop stocking rates">
      <p className="mb-3 text-dusk-300">
        Defaults used when planning a site. A contract's own colony count always wins.
      </p>
      <SimpleTable
        caption="Crop stocking rates"
        headers={['Crop', 'Colonies per acre', 'Range', 'Source']}
        rows={crops.map((c) => [
          <span className="font-medium">{c.name}</span>,
          c.hivesPerAcre ?? 'No rate (colony cap per location)',
          c.range ? `${c.range.min}–${c.range.max}` : '—',
          <span className="text-sm text-dusk-300">{c.source}</span>,
        ])}
      />
    </Section>
  );
}
