import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { SitesTable } from '@/features/sites/components/sites-table';
import type { Site } from '@/features/sites/types';
import { renderWithProviders } from './support';

const site = (name: string, crop: Site['crop'], areaHa: number | null): Site => ({
  id: `id-${name}`,
  growerId: 'g1',
  name,
  kind: 'orchard',
  crop,
  boundary: null,
  latitude: 36.6,
  longitude: -120.1,
  areaHa,
  bloomStartOn: null,
  bloomEndOn: null,
  drops: null,
  version: 1,
  archivedAt: null,
});
const sites = [
  site('Sunfold Block 7', 'almond', 40.468564224),
  site('Quarry Bench Upper', 'apple', 10),
];

describe('SitesTable', () => {
  it('when units are imperial then area shows in acres; metric in hectares', () => {
    const { unmount } = renderWithProviders(
      <SitesTable sites={sites} growerNames={{ g1: 'Sunfold' }} units="imperial" />,
    );
    expect(screen.getByText('100 acres')).toBeTruthy();
    unmount();
    renderWithProviders(
      <SitesTable sites={sites} growerNames={{ g1: 'Sunfold' }} units="metric" />,
    );
    expect(screen.getByText('40.5 ha')).toBeTruthy();
  });

  it('when a crop is chosen then only sites of that crop remain', async () => {
    const user = userEvent.setup();
    renderWithProviders(
      <SitesTable sites={sites} growerNames={{ g1: 'Sunfold' }} units="imperial" />,
    );
    await user.selectOptions(screen.getByLabelText('Crop'), 'apple');
    const links = within(screen.getByRole('table', { name: 'Sites' })).getAllByRole('link');
    expect(links.map((l) => l.textContent)).toEqual(['Quarry Bench Upper']);
  });
});
