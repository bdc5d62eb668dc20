import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { SessionLayer } from './modules/session/session-middleware';
import { yardsRouter } from './modules/yards/yards.router';
import { ledgerRouter } from './modules/ledger/ledger.router';

/** Every API resource and where it is mounted under /api. */
export function apiRouters(db: DataSource, _sessions: SessionLayer): Array<[string, Router]> {
  return [
    ['/yards', yardsRouter(db)],
    ['/ledger', ledgerRouter(db)],
  ];
}
