import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { ContractsTable } from '@/features/contracts/components/contracts-table';
import type { Contract } from '@/features/contracts/types';
import { renderWithProviders } from './support';

const contract = (id: string, growerId: string, colonies: number, fee?: number): Contract => ({
  id,
  growerId,
  siteIds: [],
  crop: 'almond',
  season: 2027,
  status: 'agreed',
  coloniesOrdered: colonies,
  minFrames: 6,
  averageFrames: null,
  ...(fee === undefined ? {} : { feePerColonyCents: fee }),
  deliveryStartOn: '2027-02-01',
  deliveryEndOn: '2027-02-08',
  removalOn: null,
  sprayNoticeHours: 48,
  terms: '',
  version: 1,
  archivedAt: null,
});
const names = { g1: 'Sunfold Almond Ranch', g2: 'Pellwick Family Farms' };

describe('ContractsTable', () => {
  it('when fees are present then the fee column shows dollars', () => {
    renderWithProviders(
      <ContractsTable contracts={[contract('a', 'g1', 640, 21550)]} growerNames={names} />,
    );
    expect(screen.getByRole('columnheader', { name: /Fee per colony/ })).toBeTruthy();
    expect(screen.getByText('$215.50')).toBeTruthy();
  });

  it('when the API sent no fees (crew) then there is no fee column and no dollar amount anywhere', () => {
    const { container } = renderWithProviders(
      <ContractsTable
        contracts={[contract('a', 'g1', 640), contract('b', 'g2', 480)]}
        growerNames={names}
      />,
    );
    expect(screen.queryByRole('columnheader', { name: /Fee/ })).toBeNull();
    expect(container.textContent).not.toMatch(/\$/);
  });

  it('when the colonies header is clicked then the largest order comes first, and again the smallest', async () => {
    const user = userEvent.setup();
    renderWithProviders(
      <ContractsTable
        contracts={[contract('b', 'g2', 480), contract('a', 'g1', 640)]}
        growerNames={names}
      />,
    );
    const table = screen.getByRole('table', { name: 'Contracts' });
    const growersInOrder = () =>
      within(table)
        .getAllByRole('link')
        .map((l) => l.textContent);

    await user.click(within(table).getByRole('button', { name: /Colonies/ }));
    expect(
      within(table)
        .getByRole('columnheader', { name: /Colonies/ })
        .getAttribute('aria-sort'),
    ).toBe('descending');
    expect(growersInOrder()).toEqual(['Sunfold Almond Ranch', 'Pellwick Family Farms']);

    await user.click(within(table).getByRole('button', { name: /Colonies/ }));
    expect(
      within(table)
        .getByRole('columnheader', { name: /Colonies/ })
        .getAttribute('aria-sort'),
    ).toBe('ascending');
    expect(growersInOrder()).toEqual(['Pellwick Family Farms', 'Sunfold Almond Ranch']);
  });
});
