import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsEnum, IsOptional } from 'class-validator';
import { AssetKind, AssetState } from '../entities/asset.entity';

/** Query of `GET /api/shows/:showId/assets`. */
export class ListAssetsQuery {
  @ApiPropertyOptional({ enum: AssetKind })
  @IsOptional()
  @IsEnum(AssetKind)
  kind?: AssetKind;

  @ApiPropertyOptional({ enum: AssetState })
  @IsOptional()
  @IsEnum(AssetState)
  state?: AssetState;
}
