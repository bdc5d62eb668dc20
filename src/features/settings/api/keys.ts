/** Query keys of the settings records. */
export const settingsKeys = {
  trucks: ['trucks'] as const,
  truckList: () => [...settingsKeys.trucks, 'list'] as const,
  hiveSetups: ['hive-setups'] as const,
  hiveSetupList: () => [...settingsKeys.hiveSetups, 'list'] as const,
  colonyLots: ['colony-lots'] as const,
  colonyLotList: () => [...settingsKeys.colonyLots, 'list'] as const,
  people: ['users'] as const,
  peopleList: () => [...settingsKeys.people, 'list'] as const,
  crops: ['crops'] as const,
};
