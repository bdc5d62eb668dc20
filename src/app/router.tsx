import type { QueryClient } from '@tanstack/react-query';
import {
  createBrowserRouter,
  redirect,
  type NonIndexRouteObject,
  type RouteObject,
} from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { PageSkeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import { setUnauthenticatedHandler } from '@/lib/api-client';
import { sessionKeys } from '@/lib/auth';
import * as appRoot from './routes/app-root';
import * as home from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import * as signIn from './routes/sign-in';
import * as portal from './routes/portal/portal';
import * as sprayNotices from './routes/spray-notices/spray-notices';
import { atlasRoute } from './routes/atlas/atlas';
import * as yards from './routes/yards/yards';
import * as yard from './routes/yards/yard';
import * as yardNew from './routes/yards/yard-new';
import * as yardEdit from './routes/yards/yard-edit';
import * as sites from './routes/sites/sites';
import * as site from './routes/sites/site';
import * as siteNew from './routes/sites/site-new';
import * as siteEdit from './routes/sites/site-edit';
import * as growers from './routes/growers/growers';
import * as grower from './routes/growers/grower';
import * as growerNew from './routes/growers/grower-new';
import * as growerEdit from './routes/growers/grower-edit';
import * as contracts from './routes/contracts/contracts';
import * as contract from './routes/contracts/contract';
import * as contractNew from './routes/contracts/contract-new';
import * as contractEdit from './routes/contracts/contract-edit';
import * as settingsLayout from './routes/settings/settings-layout';
import * as settingsIndex from './routes/settings/settings-index';
import * as settingsUnits from './routes/settings/units';
import * as settingsFleet from './routes/settings/fleet';
import * as settingsHiveSetups from './routes/settings/hive-setups';
import * as settingsColonyLots from './routes/settings/colony-lots';
import * as settingsPeople from './routes/settings/people';
import * as settingsCrops from './routes/settings/crops';
import * as moves from './routes/moves/moves';
import * as move from './routes/moves/move';
import * as moveNew from './routes/moves/move-new';
import * as moveEdit from './routes/moves/move-edit';
import * as movePrint from './routes/moves/move-print';
import * as calendarFeed from './routes/moves/calendar-feed';
import * as tonight from './routes/tonight/tonight';
import * as season from './routes/season/season';
import * as invoices from './routes/invoices/invoices';
import * as invoice from './routes/invoices/invoice';
import * as invoicePrint from './routes/invoices/invoice-print';
import * as receivables from './routes/receivables/receivables';

const errorElement = <RouteError />;

/** Every URL of the app: one route module each, its loader filling the query cache first. */
export function routes(queryClient: QueryClient): RouteObject[] {
  const page = (
    path: string,
    loader: ((qc: QueryClient) => RouteObject['loader']) | null,
    element: React.ReactNode,
  ): NonIndexRouteObject => ({
    path,
    loader: loader ? loader(queryClient) : undefined,
    element,
    errorElement,
  });
  return [
    {
      ...page('/sign-in', signIn.loader, <signIn.SignInRoute />),
      hydrateFallbackElement: <PageSkeleton />,
    },
    {
      path: '/',
      loader: appRoot.loader(queryClient),
      element: <appRoot.AppRootRoute />,
      errorElement,
      hydrateFallbackElement: <PageSkeleton />,
      children: [
        {
          errorElement,
          children: [
            { index: true, loader: home.loader(queryClient) },
            atlasRoute(queryClient),
            page('yards', yards.loader, <yards.YardsRoute />),
            page('yards/new', yardNew.loader, <yardNew.YardNewRoute />),
            page('yards/:yardId', yard.loader, <yard.YardRoute />),
            page('yards/:yardId/edit', yardEdit.loader, <yardEdit.YardEditRoute />),
            page('sites', sites.loader, <sites.SitesRoute />),
            page('sites/new', siteNew.loader, <siteNew.SiteNewRoute />),
            page('sites/:siteId', site.loader, <site.SiteRoute />),
            page('sites/:siteId/edit', siteEdit.loader, <siteEdit.SiteEditRoute />),
            page('growers', growers.loader, <growers.GrowersRoute />),
            page('growers/new', growerNew.loader, <growerNew.GrowerNewRoute />),
            page('growers/:growerId', grower.loader, <grower.GrowerRoute />),
            page('growers/:growerId/edit', growerEdit.loader, <growerEdit.GrowerEditRoute />),
            page('contracts', contracts.loader, <contracts.ContractsRoute />),
            page('contracts/new', contractNew.loader, <contractNew.ContractNewRoute />),
            page('contracts/:contractId', contract.loader, <contract.ContractRoute />),
            page(
              'contracts/:contractId/edit',
              contractEdit.loader,
              <contractEdit.ContractEditRoute />,
            ),
            page('moves', moves.loader, <moves.MovesRoute />),
            page('moves/new', moveNew.loader, <moveNew.MoveNewRoute />),
            page('moves/:moveId', move.loader, <move.MoveRoute />),
            page('moves/:moveId/edit', moveEdit.loader, <moveEdit.MoveEditRoute />),
            page('moves/:moveId/print', movePrint.loader, <movePrint.MovePrintRoute />),
            page('tonight', tonight.loader, <tonight.TonightRoute />),
            page('season', season.loader, <season.SeasonRoute />),
            page('invoices', invoices.loader, <invoices.InvoicesRoute />),
            page('invoices/:invoiceId', invoice.loader, <invoice.InvoiceRoute />),
            page(
              'invoices/:invoiceId/print',
              invoicePrint.loader,
              <invoicePrint.InvoicePrintRoute />,
            ),
            page('receivables', receivables.loader, <receivables.ReceivablesRoute />),
            page('portal', portal.loader, <portal.PortalRoute />),
            // The grower's old home; bookmarks and e-mails still point here.
            { path: 'your-contracts', loader: () => redirect(paths.portal) },
            page('spray-notices', sprayNotices.loader, <sprayNotices.SprayNoticesRoute />),
            {
              ...page('settings', settingsLayout.loader, <settingsLayout.SettingsLayoutRoute />),
              children: [
                { index: true, loader: settingsIndex.loader, element: null },
                { path: 'units', element: <settingsUnits.SettingsUnitsRoute />, errorElement },
                page('fleet', settingsFleet.loader, <settingsFleet.SettingsFleetRoute />),
                page(
                  'hive-setups',
                  settingsHiveSetups.loader,
                  <settingsHiveSetups.SettingsHiveSetupsRoute />,
                ),
                page(
                  'colony-lots',
                  settingsColonyLots.loader,
                  <settingsColonyLots.SettingsColonyLotsRoute />,
                ),
                page('people', settingsPeople.loader, <settingsPeople.SettingsPeopleRoute />),
                page('crops', settingsCrops.loader, <settingsCrops.SettingsCropsRoute />),
                page('calendar', calendarFeed.loader, <calendarFeed.CalendarFeedRoute />),
              ],
            },
            { path: '*', element: <NotFoundRoute /> },
          ],
        },
      ],
    },
  ];
}

/** The browser router; an expired session returns to sign-in and then back here. */
export function createRouter(queryClient: QueryClient) {
  const router = createBrowserRouter(routes(queryClient));
  setUnauthenticatedHandler(() => {
    const { pathname, search } = router.state.location;
    if (pathname === '/sign-in') return;
    queryClient.setQueryData(sessionKeys.all, (old: { csrfToken?: string } | undefined) => ({
      user: null,
      csrfToken: old?.csrfToken ?? '',
    }));
    void router.navigate(`/sign-in?next=${encodeURIComponent(pathname + search)}`, {
      replace: true,
    });
  });
  return router;
}
