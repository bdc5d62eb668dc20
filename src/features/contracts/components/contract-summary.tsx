import { Badge } from '@/components/ui/badge';
import { Facts } from '@/components/ui/page-header';
import { formatCount, formatDate, formatDollars } from '@/lib/units';
import type { Contract } from '../types';
import { statusLabels } from '../types';
import { cropName } from '@/lib/crops';

/** The terms of a contract at a glance; money only when the reader may see it. */
export function ContractSummary({
  contract,
  growerName,
  siteNames,
}: {
  contract: Contract;
  growerName: string;
  siteNames: string[];
}) {
  const items: Array<[string, React.ReactNode]> = [
    ['Grower', growerName],
    ['Status', <Badge>{statusLabels[contract.status]}</Badge>],
    ['Crop', cropName(contract.crop)],
    ['Season', String(contract.season)],
    ['Sites', siteNames.length ? siteNames.join(', ') : 'None chosen yet'],
    ['Colonies ordered', formatCount(contract.coloniesOrdered)],
    ['Minimum frames of bees', String(contract.minFrames)],
    [
      'Average frames of bees',
      contract.averageFrames === null ? '—' : String(contract.averageFrames),
    ],
    [
      'Delivery window',
      `${formatDate(contract.deliveryStartOn)} – ${formatDate(contract.deliveryEndOn)}`,
    ],
    ['Removal', formatDate(contract.removalOn)],
    ['Spray notice', contract.sprayNoticeHours ? `${contract.sprayNoticeHours} hours ahead` : '—'],
  ];
  if (contract.feePerColonyCents !== undefined)
    items.push(['Fee per colony', formatDollars(contract.feePerColonyCents)]);
  if (contract.depositCents !== undefined)
    items.push(['Deposit', formatDollars(contract.depositCents)]);
  return <Facts items={items} />;
}
