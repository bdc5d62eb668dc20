// The Atlas API's response shapes, defined once beside the server code that builds them.
export type {
  AtlasContract,
  AtlasContractStatus,
  AtlasDropProperties,
  AtlasMoveProperties,
  AtlasMoveStatus,
  AtlasNextMove,
  AtlasSiteProperties,
  AtlasSprayNoticeProperties,
  AtlasSummary,
  AtlasYardProperties,
  SiteBoundaryResult,
} from '@shared/schemas/atlas';
