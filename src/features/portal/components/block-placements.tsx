import { formatCount, formatDate } from '@/lib/units';
import { usePlacements } from '../api/get-placements';

/** Colonies on each block today and the strength checks the beekeeper recorded there. */
export function BlockPlacements() {
  const placements = usePlacements();
  if (placements.isPending)
    return <p className="text-dusk-300">Loading colonies on your blocks…</p>;
  if (placements.isError)
    return (
      <p role="alert" className="text-rosehip-300">
        Colonies on your blocks could not be loaded.
      </p>
    );
  const blocks = placements.data.items;
  if (blocks.every((b) => b.coloniesToday === 0 && b.strengthChecks.length === 0)) {
    return (
      <p className="text-dusk-300">
        No colonies are on your blocks today, and no strength checks are recorded yet.
      </p>
    );
  }
  return (
    <ul className="flex flex-col gap-3" aria-label="Colonies on your blocks">
      {blocks.map((block) => (
        <li key={block.siteId} className="rounded-md border border-dusk-700 p-3">
          <p className="flex flex-wrap justify-between gap-2">
            <span className="font-medium">{block.siteName}</span>
            <span>{formatCount(block.coloniesToday)} colonies placed today</span>
          </p>
          {block.strengthChecks.length > 0 && (
            <ul
              className="mt-2 flex flex-col gap-1 text-sm text-dusk-200"
              aria-label={`Strength checks at ${block.siteName}`}
            >
              {block.strengthChecks.map((check) => (
                <li key={`${check.sampledOn}-${check.coloniesInspected}`}>
                  {formatDate(check.sampledOn)}: {formatCount(check.coloniesInspected)} colonies
                  inspected
                  {check.meanFrames !== null &&
                    `, ${check.meanFrames.toFixed(1)} frames of bees on average`}
                  {check.minimumFrames !== null &&
                    check.atOrAboveMinimum !== null &&
                    `; ${formatCount(check.atOrAboveMinimum)} at or above the ${check.minimumFrames}-frame minimum`}
                </li>
              ))}
            </ul>
          )}
        </li>
      ))}
    </ul>
  );
}
