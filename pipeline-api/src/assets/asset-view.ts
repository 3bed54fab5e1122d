import type {
  Asset,
  AssetKind,
  AssetProgress,
  AssetState,
  ValidationReport,
} from './entities/asset.entity';

/** An uploaded file as the API shows it. */
export interface AssetView {
  id: string;
  showId: string;
  kind: AssetKind;
  state: AssetState;
  fileName: string;
  size: number;
  sha256: string;
  contentType: string;
  progress: AssetProgress | null;
  validationReport: ValidationReport | null;
  uploadedBy: string;
  createdAt: string;
  uploadedAt: string | null;
  checkedAt: string | null;
}

/** The view of an asset. */
export const assetView = (a: Asset): AssetView => ({
  id: a.id,
  showId: a.show.id,
  kind: a.kind,
  state: a.state,
  fileName: a.originalName,
  size: a.size,
  sha256: a.sha256,
  contentType: a.contentType,
  progress: a.progress ?? null,
  validationReport: a.validationReport ?? null,
  uploadedBy: a.uploadedBy.id,
  createdAt: a.createdAt.toISOString(),
  uploadedAt: a.uploadedAt?.toISOString() ?? null,
  checkedAt: a.checkedAt?.toISOString() ?? null,
});
