/** A grower contact as the API presents it. */
export interface GrowerContact {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  title: string;
}

/** A grower (customer) with their contacts; internal notes are absent for growers themselves. */
export interface Grower {
  id: string;
  name: string;
  billingAddress: string;
  internalNotes?: string;
  contacts: GrowerContact[];
  version: number;
  archivedAt: string | null;
}
