import { Controller, Get, Param, Req, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentPrincipal } from '../common/decorators/current-user.decorator';
import type { AuthedRequest, Principal } from '../auth/principal';
import { ShowEventsHub } from './show-events-hub';

/** Live progress of a show's uploads, jobs and takes, as server-sent events. */
@ApiTags('events')
@Controller('shows/:showId/events')
export class ShowEventsController {
  constructor(private readonly hub: ShowEventsHub) {}

  /** The show's event stream; stays open until the client leaves or the server stops. */
  @Get()
  @Allow(...ANY_ROLE)
  @AllowToken()
  // Only the stream itself is text/event-stream; refusals are JSON like everywhere else.
  @ApiOkResponse({
    description: 'The event stream.',
    content: { 'text/event-stream': { schema: { type: 'string' } } },
  })
  @ApiOperation({
    summary: 'Stream live job and ingest progress (server-sent events)',
    description:
      'Events: `asset.progress` {assetId, kind, stage, percent, state} (to those who may read ' +
      'the upload list), `job.progress` {jobId, kind, shotId, profileId, stage, percent}, ' +
      '`job.state` {jobId, kind, shotId, profileId, state, errorCode, errorMessage}, ' +
      '`take.ready` {takeId, shotId, jobId, version}; each with `at`. A comment line every ' +
      '15 s keeps the stream alive. Events are not replayed: after reconnecting, read the ' +
      'current state from the polling routes.',
  })
  @ApiErrors('SHOW_NOT_FOUND')
  stream(
    @CurrentPrincipal() principal: Principal,
    @Param('showId') showId: string,
    @Req() req: AuthedRequest,
    @Res() res: Response,
  ): void {
    this.hub.open(showId, principal, req, res);
  }
}
