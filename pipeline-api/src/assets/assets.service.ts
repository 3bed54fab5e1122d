import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import type { FilterQuery } from '@mikro-orm/core';
import { Asset, type AssetKind, type AssetState } from './entities/asset.entity';
import { assetView, type AssetView } from './asset-view';
import { assetNotFound } from './asset-errors';

/** Reads uploads with their state, progress and validation report. */
@Injectable()
export class AssetsService {
  constructor(private readonly em: EntityManager) {}

  /** The show's uploads, newest first, optionally of one kind or state (at most 500). */
  async list(
    showId: string,
    filter: { kind?: AssetKind; state?: AssetState },
  ): Promise<AssetView[]> {
    const where: FilterQuery<Asset> = { show: showId };
    if (filter.kind) where.kind = filter.kind;
    if (filter.state) where.state = filter.state;
    const assets = await this.em.find(Asset, where, { orderBy: { createdAt: 'desc' }, limit: 500 });
    return assets.map(assetView);
  }

  /** One upload of the show. */
  async get(showId: string, assetId: string): Promise<AssetView> {
    const asset = await this.em.findOne(Asset, { id: assetId, show: showId });
    if (!asset) throw assetNotFound(assetId);
    return assetView(asset);
  }
}
