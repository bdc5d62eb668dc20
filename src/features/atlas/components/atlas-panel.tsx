import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Units } from '@shared/schemas/users';
import type { CropKey } from '@shared/schemas/sites';
import { paths } from '@/config/paths';
import { canPlan, useUser } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { formatArea, formatCount, formatDate, formatDateTime, formatDollars } from '@/lib/units';
import type { AtlasNextMove, AtlasSummary } from '../api/types';
import { contractStateLabels } from '../lib/overlay-styles';
import type { AtlasSelection } from '../lib/selection';

interface AtlasPanelProps {
  atlas: AtlasSummary;
  selection: AtlasSelection | null;
  units: Units;
  onSelect: (selection: AtlasSelection | null) => void;
  /** Boundary and drop tools for the selected site (planners and owners only). */
  siteTools?: ReactNode;
}

/** The side panel: what is selected, with its counts, contract, next move and record links. */
export function AtlasPanel({ atlas, selection, units, onSelect, siteTools }: AtlasPanelProps) {
  const body = (() => {
    switch (selection?.kind) {
      case 'yard':
        return <YardDetails atlas={atlas} id={selection.id} />;
      case 'site':
        return <SiteDetails atlas={atlas} id={selection.id} units={units} tools={siteTools} />;
      case 'move':
        return <MoveDetails atlas={atlas} id={selection.id} onSelect={onSelect} />;
      case 'spray':
        return <SprayDetails atlas={atlas} id={selection.id} onSelect={onSelect} />;
      case 'grower':
        return <GrowerDetails atlas={atlas} id={selection.id} onSelect={onSelect} />;
      default:
        return <SeasonSummary atlas={atlas} />;
    }
  })();
  return (
    <aside
      role="complementary"
      aria-labelledby="atlas-panel-heading"
      className="flex flex-col gap-3 rounded-lg border border-dusk-700 bg-dusk-850 p-4"
    >
      {body ?? (
        <>
          <h2 id="atlas-panel-heading" className="text-lg font-semibold">
            Not on the map on this date
          </h2>
          <p className="text-dusk-300">It may be archived, or outside the dates shown.</p>
        </>
      )}
      {selection && (
        <button
          type="button"
          className="self-start text-sm text-ember-300 underline"
          onClick={() => onSelect(null)}
        >
          Back to the season summary
        </button>
      )}
    </aside>
  );
}

function Heading({ children, kicker }: { children: ReactNode; kicker: string }) {
  return (
    <div>
      <p className="text-xs tracking-wide text-dusk-300 uppercase">{kicker}</p>
      <h2 id="atlas-panel-heading" className="text-lg font-semibold text-dusk-50">
        {children}
      </h2>
    </div>
  );
}

function Facts({ items }: { items: Array<[string, ReactNode]> }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
      {items.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-dusk-300">{term}</dt>
          <dd className="text-dusk-100">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

const nextMoveText = (move: AtlasNextMove | null) =>
  move
    ? `${move.name}, night of ${formatDate(move.nightOf)} (${move.direction === 'out' ? 'leaving' : 'arriving'}, ${move.status})`
    : 'None planned';

function SeasonSummary({ atlas }: { atlas: AtlasSummary }) {
  return (
    <>
      <Heading kicker="Season">On {formatDate(atlas.on)}</Heading>
      <Facts
        items={[
          ['Colonies', formatCount(atlas.totalColonies)],
          ['Yards', formatCount(atlas.yards.features.length)],
          ['Sites', formatCount(atlas.sites.features.length)],
          [
            'Moves',
            `${atlas.moves.features.length} between ${formatDate(atlas.movesWindow.from)} and ${formatDate(atlas.movesWindow.to)}`,
          ],
          [
            'Spray notices',
            atlas.sprayNotices.features.length
              ? `${atlas.sprayNotices.features.length} in the next days`
              : 'None',
          ],
        ]}
      />
      <p className="text-sm text-dusk-300">
        Select a yard, site or move on the map, or search by name.
      </p>
    </>
  );
}

function YardDetails({ atlas, id }: { atlas: AtlasSummary; id: string }) {
  const yard = atlas.yards.features.find((f) => f.properties.id === id)?.properties;
  if (!yard) return null;
  return (
    <>
      <Heading kicker="Yard">{yard.name}</Heading>
      <Facts
        items={[
          ['Colonies', `${formatCount(yard.colonies)} of ${formatCount(yard.capacity)} capacity`],
          ['Last visit', yard.lastVisitOn ? formatDate(yard.lastVisitOn) : 'Not recorded'],
          ['Next move', nextMoveText(yard.nextMove)],
        ]}
      />
      <LotList lots={yard.lots} />
      <Link to={paths.yard(yard.id)}>Open the yard record</Link>
    </>
  );
}

function LotList({
  lots,
}: {
  lots: Array<{ lotId: string; lotName: string; hiveSetupName: string; colonies: number }>;
}) {
  if (lots.length === 0)
    return <p className="text-sm text-dusk-300">No colonies here on this date.</p>;
  return (
    <ul className="text-sm">
      {lots.map((lot) => (
        <li key={lot.lotId}>
          {formatCount(lot.colonies)} × {lot.lotName}{' '}
          <span className="text-dusk-300">({lot.hiveSetupName})</span>
        </li>
      ))}
    </ul>
  );
}

function SiteDetails({
  atlas,
  id,
  units,
  tools,
}: {
  atlas: AtlasSummary;
  id: string;
  units: Units;
  tools?: ReactNode;
}) {
  const canPlanMoves = canPlan(useUser());
  const site = atlas.sites.features.find((f) => f.properties.id === id)?.properties;
  if (!site) return null;
  const contract = site.contract;
  return (
    <>
      <Heading kicker={site.kind === 'honey' ? 'Honey location' : 'Site'}>{site.name}</Heading>
      <Facts
        items={[
          ['Grower', site.growerName ?? 'Our own location'],
          ['Crop', cropName(site.crop as CropKey)],
          ['Area', site.areaHa ? formatArea(site.areaHa, units) : 'No boundary yet'],
          ['Colonies', formatCount(site.colonies)],
          ['Drops', site.dropCount ? String(site.dropCount) : 'None planned'],
          [
            'Bloom',
            site.bloomStartOn
              ? `${formatDate(site.bloomStartOn)} – ${formatDate(site.bloomEndOn)}`
              : 'Not set',
          ],
          ['Next move', nextMoveText(site.nextMove)],
        ]}
      />
      <LotList lots={site.lots} />
      <section aria-label="Contract" className="rounded-md border border-dusk-700 p-3 text-sm">
        <h3 className="font-semibold">Contract</h3>
        {contract ? (
          <>
            <Facts
              items={[
                ['Status', contractStateLabels[contract.status]],
                [
                  'Ordered',
                  `${formatCount(contract.coloniesOrdered)} colonies, ${contract.minFrames} frames minimum`,
                ],
                [
                  'Delivery',
                  `${formatDate(contract.deliveryStartOn)} – ${formatDate(contract.deliveryEndOn)}`,
                ],
                ['Removal', contract.removalOn ? formatDate(contract.removalOn) : 'Not set'],
                ...(contract.feePerColonyCents !== undefined
                  ? ([['Fee', `${formatDollars(contract.feePerColonyCents)} per colony`]] as Array<
                      [string, string]
                    >)
                  : []),
              ]}
            />
            <Link to={paths.contract(contract.id)}>Open the contract</Link>
          </>
        ) : (
          <p className="text-dusk-300">No contract covers this site.</p>
        )}
      </section>
      {tools}
      <Link to={paths.site(site.id)}>Open the site record</Link>
      {canPlanMoves && <Link to={`${paths.moveNew}?to=${site.id}`}>Plan a move to this block</Link>}
    </>
  );
}

function PlaceButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <button type="button" className="text-left text-ember-300 underline" onClick={onClick}>
      {label}
    </button>
  );
}

function MoveDetails({
  atlas,
  id,
  onSelect,
}: {
  atlas: AtlasSummary;
  id: string;
  onSelect: AtlasPanelProps['onSelect'];
}) {
  const move = atlas.moves.features.find((f) => f.properties.id === id)?.properties;
  if (!move) return null;
  const yardName = (yardId: string) =>
    atlas.yards.features.find((f) => f.properties.id === yardId)?.properties.name ?? 'A yard';
  const destinationName = (placeId: string) =>
    (move.destinationKind === 'yard'
      ? atlas.yards.features.find((f) => f.properties.id === placeId)?.properties.name
      : atlas.sites.features.find((f) => f.properties.id === placeId)?.properties.name) ??
    'A place';
  return (
    <>
      <Heading kicker="Move">{move.name}</Heading>
      <Facts
        items={[
          ['Night of', formatDate(move.nightOf)],
          ['Status', move.status],
          ['Colonies', formatCount(move.colonies)],
        ]}
      />
      <div className="text-sm">
        <h3 className="font-semibold">From</h3>
        <ul>
          {move.originYardIds.map((yardId) => (
            <li key={yardId}>
              <PlaceButton
                label={yardName(yardId)}
                onClick={() => onSelect({ kind: 'yard', id: yardId })}
              />
            </li>
          ))}
        </ul>
        <h3 className="mt-2 font-semibold">To</h3>
        <ul>
          {move.destinationIds.map((placeId) => (
            <li key={placeId}>
              <PlaceButton
                label={destinationName(placeId)}
                onClick={() => onSelect({ kind: move.destinationKind, id: placeId })}
              />
            </li>
          ))}
        </ul>
      </div>
    </>
  );
}

function SprayDetails({
  atlas,
  id,
  onSelect,
}: {
  atlas: AtlasSummary;
  id: string;
  onSelect: AtlasPanelProps['onSelect'];
}) {
  const notice = atlas.sprayNotices.features.find((f) => f.properties.id === id)?.properties;
  if (!notice) return null;
  const when = `${formatDateTime(notice.startsAt)} – ${formatDateTime(notice.endsAt)}`;
  return (
    <>
      <Heading kicker="Spray notice">{notice.product}</Heading>
      <Facts
        items={[
          [
            'Site',
            <PlaceButton
              key="site"
              label={notice.siteName}
              onClick={() => onSelect({ kind: 'site', id: notice.siteId })}
            />,
          ],
          ['When', when],
          ['Status', notice.status],
          ['Reach', `${notice.reachKm} km`],
        ]}
      />
      <div className="text-sm">
        <h3 className="font-semibold">Yards within reach</h3>
        {notice.yardsInReach.length ? (
          <ul>
            {notice.yardsInReach.map((yard) => (
              <li key={yard.id}>
                <PlaceButton
                  label={`${yard.name} (${yard.distanceKm} km)`}
                  onClick={() => onSelect({ kind: 'yard', id: yard.id })}
                />
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-dusk-300">None.</p>
        )}
        <h3 className="mt-2 font-semibold">Other sites within reach</h3>
        {notice.sitesInReach.length ? (
          <ul>
            {notice.sitesInReach.map((site) => (
              <li key={site.id}>
                <PlaceButton
                  label={`${site.name} (${site.distanceKm} km)`}
                  onClick={() => onSelect({ kind: 'site', id: site.id })}
                />
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-dusk-300">None.</p>
        )}
      </div>
    </>
  );
}

function GrowerDetails({
  atlas,
  id,
  onSelect,
}: {
  atlas: AtlasSummary;
  id: string;
  onSelect: AtlasPanelProps['onSelect'];
}) {
  const grower = atlas.growers.find((g) => g.id === id);
  if (!grower) return null;
  return (
    <>
      <Heading kicker="Grower">{grower.name}</Heading>
      {grower.siteIds.length ? (
        <ul className="text-sm">
          {grower.siteIds.map((siteId) => (
            <li key={siteId}>
              <PlaceButton
                label={
                  atlas.sites.features.find((f) => f.properties.id === siteId)?.properties.name ??
                  'A site'
                }
                onClick={() => onSelect({ kind: 'site', id: siteId })}
              />
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-dusk-300">No sites on the map.</p>
      )}
      <Link to={paths.grower(grower.id)}>Open the grower record</Link>
    </>
  );
}
