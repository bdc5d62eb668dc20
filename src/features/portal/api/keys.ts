/** Query keys of the portal's own reads: ['portal','proposals',filters] and so on. */
export const portalKeys = {
  all: ['portal'] as const,
  proposals: (filters: { status?: string }) => [...portalKeys.all, 'proposals', filters] as const,
  documents: () => [...portalKeys.all, 'documents'] as const,
  invoices: () => [...portalKeys.all, 'invoices'] as const,
  placements: () => [...portalKeys.all, 'placements'] as const,
};
