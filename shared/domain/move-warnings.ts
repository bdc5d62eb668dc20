/**
 * Warnings and cautions for a planned move: what is wrong with the plan (warnings) and the
 * standing safety notes that apply to the night (cautions). Pure: the caller gathers the facts.
 *
 * Seasonal cautions use no weather service. The rule of thumb is common practice of the trade
 * [practice]: in the northern hemisphere a stopped load is at risk of overheating from May to
 * September, and cold nights chill an open, netted load from November to February; the southern
 * hemisphere is shifted by six months. It errs on the side of showing the caution.
 */
import { parseCalendarDate } from './calendar-date';
import { formatLocalTime } from './local-time';

/** How serious a warning is: `danger` breaks a rule or a contract, `warning` needs a look. */
export type WarningSeverity = 'danger' | 'warning' | 'info';

/** Stable codes the client can key its texts and icons on. */
export type MoveWarningCode =
  | 'arrives-after-dawn'
  | 'multi-night-haul'
  | 'over-payload'
  | 'over-legal-gross'
  | 'no-trucks'
  | 'contract-not-agreed'
  | 'colonies-too-weak'
  | 'strength-unknown'
  | 'short-of-order'
  | 'colonies-not-available'
  | 'weights-assumed';

/** One problem with the plan. */
export interface MoveWarning {
  /** Stable code. */
  code: MoveWarningCode;
  /** How serious. */
  severity: WarningSeverity;
  /** One sentence for the planner. */
  message: string;
  /** The truck (load index key) it concerns, when it concerns one. */
  truckKey?: string;
  /** The yard it concerns, when it concerns one. */
  yardId?: string;
  /** The lot it concerns, when it concerns one. */
  lotId?: string;
}

/** Codes of the standing safety notes. */
export type MoveCautionCode =
  'night-driving' | 'netting-ventilation' | 'heat-stopped-load' | 'cold-night' | 'lifting';

/** A safety note for the crew; each defers to state rules and licensed practice. */
export interface MoveCaution {
  /** Stable code. */
  code: MoveCautionCode;
  /** The note as printed on the load sheet. */
  message: string;
}

/** One truck's part of the facts. */
export interface TruckFacts {
  /** Key of the load (its position in the plan), echoed back. */
  key: string;
  /** Truck name for the message. */
  name: string;
  /** Colonies aboard. */
  colonies: number;
  /** One-sided 95 % upper bound of the load, kg. */
  weightUpperKg: number;
  /** Legal payload, kg. */
  payloadKg: number;
  /** Tare + upper-bound load, kg. */
  grossKg: number;
  /** Legal gross limit, kg. */
  legalGrossKg: number;
  /** Whether this truck reaches the destination by the first civil dawn (null: no dawn or no load). */
  arrivesBeforeDawn: boolean | null;
  /** Whether it arrives between civil dusk and civil dawn of its local night, that night or a later one. */
  arrivesInDarkness?: boolean | null;
  /** Arrival, ISO 8601 in the destination's zone. */
  arrival: string | null;
  /** Civil dawn at the destination, ISO 8601 in its zone. */
  civilDawn: string | null;
}

/** One origin (colonies of one lot at one yard) as the warnings need it. */
export interface OriginFacts {
  yardId: string;
  yardName: string;
  lotId: string;
  lotName: string;
  /** Colonies the plan takes. */
  colonies: number;
  /** Colonies free on the night: ledger minus other open moves' promises (summed per yard and lot). */
  freeColonies: number;
  /** Mean frames of bees (latest strength sample, else the lot's), or null when unknown. */
  meanFrames: number | null;
  /** Whether the hive weight was computed from the box setup instead of weighed. */
  weightAssumed: boolean;
}

/** The contract the move serves, without money. */
export interface ContractFacts {
  status: string;
  coloniesOrdered: number;
  minFrames: number;
  /** Colonies of this contract that other open or placed moves carry. */
  coloniesOnOtherMoves: number;
}

/** Everything moveWarnings looks at. */
export interface MoveWarningFacts {
  /** Trucks of the plan (those carrying nothing included). */
  trucks: readonly TruckFacts[];
  /** Origins in pick-up order. */
  origins: readonly OriginFacts[];
  /** Colonies that fit on no truck. */
  unassignedColonies: number;
  /** The contract, when the move serves one. */
  contract: ContractFacts | null;
}

const kg = (value: number) => `${Math.round(value).toLocaleString('en-US')} kg`;

/** The plan's problems, most serious first. */
export function moveWarnings(facts: MoveWarningFacts): MoveWarning[] {
  const warnings: MoveWarning[] = [];
  const loaded = facts.trucks.filter((t) => t.colonies > 0);

  if (facts.trucks.length === 0) {
    warnings.push({
      code: 'no-trucks',
      severity: 'warning',
      message: 'No trucks chosen yet: add trucks to see the load sheet.',
    });
  } else if (facts.unassignedColonies > 0) {
    warnings.push({
      code: 'over-payload',
      severity: 'danger',
      message: `${facts.unassignedColonies} colonies do not fit on these trucks within payload, deck space and the 95 % weight bound: add a truck or take fewer colonies.`,
    });
  }
  for (const t of loaded) {
    if (t.weightUpperKg > t.payloadKg) {
      warnings.push({
        code: 'over-payload',
        severity: 'danger',
        truckKey: t.key,
        message: `${t.name}: the load may weigh up to ${kg(t.weightUpperKg)}, over its payload of ${kg(t.payloadKg)}.`,
      });
    }
    if (t.grossKg > t.legalGrossKg) {
      warnings.push({
        code: 'over-legal-gross',
        severity: 'danger',
        truckKey: t.key,
        message: `${t.name}: truck and load may weigh up to ${kg(t.grossKg)}, over the legal gross of ${kg(t.legalGrossKg)}. Check the route's state limits and permits.`,
      });
    }
    if (t.arrivesBeforeDawn === false && t.arrivesInDarkness === true) {
      warnings.push({
        code: 'multi-night-haul',
        severity: 'info',
        truckKey: t.key,
        message: `${t.name} is on the road past the first dawn and arrives in the dark at ${t.arrival ? formatLocalTime(t.arrival) : 'an unknown time'}: keep the load moving, shaded and watered at stops, and plan the drivers' rests.`,
      });
    } else if (t.arrivesBeforeDawn === false) {
      warnings.push({
        code: 'arrives-after-dawn',
        severity: 'danger',
        truckKey: t.key,
        message: `${t.name} arrives at ${t.arrival ? formatLocalTime(t.arrival) : 'an unknown time'}, after civil dawn (${t.civilDawn ? formatLocalTime(t.civilDawn) : 'unknown'}): bees will be flying at unloading. Leave earlier, add a driver, or hold at a yard near the site.`,
      });
    }
  }

  const contract = facts.contract;
  if (contract) {
    if (contract.status !== 'agreed' && contract.status !== 'in-bloom') {
      warnings.push({
        code: 'contract-not-agreed',
        severity: 'warning',
        message: `The contract is ${contract.status}, not agreed: confirm it with the grower before the trucks roll.`,
      });
    }
    const total = facts.origins.reduce((s, o) => s + o.colonies, 0) + contract.coloniesOnOtherMoves;
    if (total < contract.coloniesOrdered) {
      warnings.push({
        code: 'short-of-order',
        severity: 'warning',
        message: `This move and the contract's other moves carry ${total} colonies; the grower ordered ${contract.coloniesOrdered} (${contract.coloniesOrdered - total} short).`,
      });
    }
    for (const o of facts.origins) {
      if (o.meanFrames === null) {
        warnings.push({
          code: 'strength-unknown',
          severity: 'info',
          yardId: o.yardId,
          lotId: o.lotId,
          message: `${o.lotName} at ${o.yardName}: no strength on record to compare with the contract's ${contract.minFrames}-frame minimum.`,
        });
      } else if (o.meanFrames < contract.minFrames) {
        warnings.push({
          code: 'colonies-too-weak',
          severity: 'warning',
          yardId: o.yardId,
          lotId: o.lotId,
          message: `${o.lotName} at ${o.yardName} averages ${o.meanFrames.toFixed(1)} frames of bees, below the contract's minimum of ${contract.minFrames}.`,
        });
      }
    }
  }

  const seen = new Set<string>();
  for (const o of facts.origins) {
    const key = `${o.yardId}:${o.lotId}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const wanted = facts.origins
      .filter((x) => x.yardId === o.yardId && x.lotId === o.lotId)
      .reduce((s, x) => s + x.colonies, 0);
    if (wanted > o.freeColonies) {
      warnings.push({
        code: 'colonies-not-available',
        severity: 'danger',
        yardId: o.yardId,
        lotId: o.lotId,
        message: `${o.lotName} at ${o.yardName}: ${wanted} wanted, only ${Math.max(0, o.freeColonies)} free that night (the ledger less other moves' promises).`,
      });
    }
  }
  for (const o of facts.origins.filter((x) => x.weightAssumed)) {
    warnings.push({
      code: 'weights-assumed',
      severity: 'info',
      yardId: o.yardId,
      lotId: o.lotId,
      message: `${o.lotName} at ${o.yardName} has no weighed hives: its weight is computed from the box setup with a wide margin. Weigh 10 or more hives to load closer to payload.`,
    });
  }
  const rank: Record<WarningSeverity, number> = { danger: 0, warning: 1, info: 2 };
  return warnings.sort((a, b) => rank[a.severity] - rank[b.severity]);
}

/** Which seasonal caution applies on a night at a latitude (rule of thumb, see the file's doc). */
export function seasonalRisk(nightOf: string, latitude: number): 'heat' | 'cold' | null {
  const { month } = parseCalendarDate(nightOf);
  const northern = latitude >= 0 ? month : ((month + 5) % 12) + 1;
  if (northern >= 5 && northern <= 9) return 'heat';
  if (northern >= 11 || northern <= 2) return 'cold';
  return null;
}

/** The safety notes for a night's move: always the standing ones, plus heat or cold by season. */
export function moveCautions(input: {
  nightOf: string;
  /** Latitudes of the origin yards and the destination. */
  latitudes: readonly number[];
}): MoveCaution[] {
  const cautions: MoveCaution[] = [
    {
      code: 'night-driving',
      message:
        'Night driving: plan rests within hours-of-service limits, watch for fatigue and wildlife, and follow the route states’ rules for bee loads.',
    },
    {
      code: 'netting-ventilation',
      message:
        'Keep the load netted under and over and strapped from the yard to the drop, and leave air moving through it; many states require netting or screening in transit.',
    },
    {
      code: 'lifting',
      message:
        'Full hives are heavy: move pallets with the loader, not by hand; wear a veil and keep an allergy kit in the cab.',
    },
  ];
  const risks = new Set(input.latitudes.map((lat) => seasonalRisk(input.nightOf, lat)));
  if (risks.has('heat')) {
    cautions.push({
      code: 'heat-stopped-load',
      message:
        'Heat: a stopped load overheats quickly. Keep it moving, park in shade, soak the bees with water at stops, and avoid long waits at inspection stations in the heat of the day.',
    });
  }
  if (risks.has('cold')) {
    cautions.push({
      code: 'cold-night',
      message:
        'Cold night: keep stops short so the netted load does not chill, and do not open hives below about 45 °F.',
    });
  }
  return cautions;
}
