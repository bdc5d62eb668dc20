import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import { yardsRouter } from './modules/yards/yards.router';
import { sitesRouter } from './modules/sites/sites.router';
import { growersRouter } from './modules/growers/growers.router';
import { contractsRouter } from './modules/contracts/contracts.router';
import { trucksRouter } from './modules/trucks/trucks.router';
import { movesRouter } from './modules/moves/moves.router';
import { hiveSetupsRouter } from './modules/hive-setups/hive-setups.router';
import { colonyLotsRouter } from './modules/colony-lots/colony-lots.router';
import { ledgerRouter } from './modules/ledger/ledger.router';
import { usersRouter } from './modules/users/users.router';
import { samplesRouters } from './modules/samples/samples.router';
import { calcRouter } from './modules/calc/calc.router';
import { cropsRouter } from './modules/calc/crops.router';
import type { RoadDistance } from './modules/calc/routing-service';

/** Every API resource and where it is mounted under /api. */
export function apiRouters(db: DataSource, roads: RoadDistance | null): Array<[string, Router]> {
  return [
    ['/yards', yardsRouter(db)],
    ['/sites', sitesRouter(db)],
    ['/growers', growersRouter(db)],
    ['/contracts', contractsRouter(db)],
    ['/trucks', trucksRouter(db)],
    ['/moves', movesRouter(db)],
    ['/hive-setups', hiveSetupsRouter(db)],
    ['/colony-lots', colonyLotsRouter(db)],
    ['/ledger', ledgerRouter(db)],
    ['/users', usersRouter(db)],
    ...samplesRouters(db),
    ['/calc', calcRouter(roads)],
    ['/crops', cropsRouter()],
  ];
}
