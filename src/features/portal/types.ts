import type { ProposalStatus } from '@shared/schemas/proposals';

/** A proposed delivery window as the API presents it. */
export interface Proposal {
  id: string;
  contractId: string;
  deliveryStartOn: string;
  deliveryEndOn: string;
  colonies: number;
  note: string;
  status: ProposalStatus;
  expiresAt: string;
  respondedAt: string | null;
  respondedVia: string | null;
  counter: { deliveryStartOn: string; deliveryEndOn: string; colonies: number | null } | null;
  responseNote: string;
  version: number;
  createdAt: string;
}

/** A document shared with the grower (growers never see sharing or uploader fields). */
export interface SharedDocument {
  id: string;
  kind: string;
  name: string;
  contentType: string;
  sizeBytes: number;
  attachedKind: 'contract' | 'site' | 'yard' | 'move';
  attachedId: string;
  downloadUrl: string;
  createdAt: string;
}

/** The parts of an invoice the portal lists. */
export interface PortalInvoice {
  id: string;
  number: string | null;
  status: string;
  contractId: string | null;
  crop: string | null;
  season: number | null;
  amountCents: number;
  outstandingCents: number;
  issuedOn: string | null;
  dueOn: string | null;
}

export const documentKindLabels: Record<string, string> = {
  contract: 'Contract',
  'inspection-certificate': 'Inspection certificate',
  photo: 'Photo',
  boundary: 'Boundary file',
  other: 'Document',
};
