import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { YardView } from '@shared/schemas/yards';
import { YardsTable } from '@/features/yards/components/yards-table';
import { renderWithProviders } from './support';

const setup = (id: string, name: string, colonies: number) => ({
  hiveSetupId: id,
  hiveSetupName: name,
  colonies,
});
const yard = (
  name: string,
  colonies: number,
  bySetup: YardView['coloniesBySetup'],
  lastVisitOn: string | null,
): YardView => ({
  id: `id-${name}`,
  name,
  latitude: 28,
  longitude: -98,
  capacity: 500,
  accessNotes: '',
  notes: '',
  lastVisitOn,
  version: 1,
  archivedAt: null,
  colonies,
  coloniesBySetup: bySetup,
});

const yards = [
  yard('Tecolote Draw', 442, [setup('two', 'Two deeps', 442)], '2026-12-09'),
  yard('Caliche Pit', 309, [setup('one', 'Single deep', 309)], '2026-11-30'),
  yard(
    'Old Dipping Vat',
    382,
    [setup('ds', 'Deep + shallow', 286), setup('one', 'Single deep', 96)],
    null,
  ),
];

/** Yard names in the order the table shows them. */
const shownNames = () =>
  within(screen.getByRole('table', { name: 'Yards' }))
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).queryByRole('link')?.textContent)
    .filter(Boolean);

describe('YardsTable', () => {
  it('when first shown then yards are in name order with colonies by box setup', () => {
    renderWithProviders(<YardsTable yards={yards} />);
    expect(shownNames()).toEqual(['Caliche Pit', 'Old Dipping Vat', 'Tecolote Draw']);
    const vat = screen.getByRole('link', { name: 'Old Dipping Vat' }).closest('tr')!;
    expect(within(vat).getByText(/Deep \+ shallow/)).toBeTruthy();
    expect(within(vat).getByText('286')).toBeTruthy();
  });

  it('when the colonies header is clicked then rows sort by colonies, and again to reverse', async () => {
    const user = userEvent.setup();
    renderWithProviders(<YardsTable yards={yards} />);

    await user.click(screen.getByRole('button', { name: /Colonies/ }));
    const header = screen.getByRole('columnheader', { name: /Colonies/ });
    const first = header.getAttribute('aria-sort');
    const firstOrder = shownNames();
    await user.click(screen.getByRole('button', { name: /Colonies/ }));
    const secondOrder = shownNames();

    expect([first, header.getAttribute('aria-sort')].sort()).toEqual(['ascending', 'descending']);
    expect(firstOrder).toEqual(
      first === 'ascending'
        ? ['Caliche Pit', 'Old Dipping Vat', 'Tecolote Draw']
        : ['Tecolote Draw', 'Old Dipping Vat', 'Caliche Pit'],
    );
    expect(secondOrder).toEqual([...firstOrder].reverse());
  });

  it('when a name is searched then only matching yards remain', async () => {
    const user = userEvent.setup();
    renderWithProviders(<YardsTable yards={yards} />);
    await user.type(screen.getByLabelText('Find a yard'), 'teco');
    expect(shownNames()).toEqual(['Tecolote Draw']);
  });

  it('when a box setup is chosen then only yards holding it remain', async () => {
    const user = userEvent.setup();
    renderWithProviders(<YardsTable yards={yards} />);
    await user.selectOptions(screen.getByLabelText('Holding box setup'), 'one');
    expect(shownNames()).toEqual(['Caliche Pit', 'Old Dipping Vat']);
  });

  it('when nothing matches then says how to get rows back', async () => {
    const user = userEvent.setup();
    renderWithProviders(<YardsTable yards={yards} />);
    await user.type(screen.getByLabelText('Find a yard'), 'nowhere');
    expect(screen.getByText(/No yard matches/)).toBeTruthy();
  });
});
