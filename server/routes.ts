import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import { yardsRouter } from './modules/yards/yards.router';
import { sitesRouter } from './modules/sites/sites.router';
import { atlasRouter, siteBoundaryRouter } from './modules/atlas/atlas.router';
import { growersRouter } from './modules/growers/growers.router';
import { contractsRouter } from './modules/contracts/contracts.router';
import { trucksRouter } from './modules/trucks/trucks.router';
import { movesRouter } from './modules/moves/moves.router';
import { movePlanningRouter } from './modules/moves/move-planning.router';
import { calendarFeedsRouter } from './modules/moves/calendar-feed';
import { seasonRouter } from './modules/season/season.router';
import { hiveSetupsRouter } from './modules/hive-setups/hive-setups.router';
import { colonyLotsRouter } from './modules/colony-lots/colony-lots.router';
import { ledgerRouter } from './modules/ledger/ledger.router';
import { usersRouter } from './modules/users/users.router';
import { samplesRouters } from './modules/samples/samples.router';
import { portalRouter } from './modules/portal/portal.router';
import { calcRouter } from './modules/calc/calc.router';
import { cropsRouter } from './modules/calc/crops.router';
import type { RoadDistance } from './modules/calc/routing-service';
import type { Env } from './config/env';
import type { JobQueue } from './modules/jobs/job-queue';
import { contractProposalsRouter, proposalsRouter } from './modules/proposals/proposals.router';
import { notificationsRouter } from './modules/notifications/notifications.router';
import { sprayNoticesRouter } from './modules/spray-notices/spray-notices.router';
import { documentsRouter } from './modules/documents/documents.router';
import { invoicesRouter, receivablesRouter } from './modules/invoices/invoices.router';
import { paymentsRouter } from './modules/payments/payments.router';

/** Every API resource and where it is mounted under /api. */
export function apiRouters(
  db: DataSource,
  roads: RoadDistance | null,
  { env, jobs }: { env: Env; jobs: JobQueue },
): Array<[string, Router]> {
  return [
    ['/yards', yardsRouter(db)],
    ['/sites', sitesRouter(db)],
    ['/sites', siteBoundaryRouter(db)],
    ['/atlas', atlasRouter(db)],
    ['/growers', growersRouter(db)],
    ['/contracts', contractsRouter(db)],
    ['/contracts', contractProposalsRouter({ db, env, jobs })],
    ['/proposals', proposalsRouter({ db, env, jobs })],
    ['/notifications', notificationsRouter(db)],
    ['/spray-notices', sprayNoticesRouter({ db, env, jobs })],
    ['/documents', documentsRouter(db, env)],
    ['/trucks', trucksRouter(db)],
    // Before the resource routes, so /moves/preview and /moves/availability are not read as ids.
    ['/moves', movePlanningRouter(db)],
    ['/moves', movesRouter(db)],
    ['/calendar-feeds', calendarFeedsRouter(db)],
    ['/season', seasonRouter(db)],
    ['/hive-setups', hiveSetupsRouter(db)],
    ['/colony-lots', colonyLotsRouter(db)],
    ['/ledger', ledgerRouter(db)],
    ['/users', usersRouter(db)],
    ...samplesRouters(db),
    ['/portal', portalRouter(db)],
    ['/calc', calcRouter(roads)],
    ['/crops', cropsRouter()],
    ['/invoices', invoicesRouter({ db, env, jobs })],
    ['/payments', paymentsRouter(db)],
    ['/receivables', receivablesRouter(db)],
  ];
}
