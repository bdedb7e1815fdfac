import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { DesignDto } from '../designs/dto/design.dto.js';
import { UserRefDto } from '../projects/dto/project.dto.js';
import type { User } from '../users/user.entity.js';
import { HistoryEntryDto, TransitionDto } from './dto/transition.dto.js';
import { ReviewService } from './review.service.js';

/** Review of designs: status changes, new revisions, the audit trail. */
@ApiTags('review')
@ApiBearerAuth()
@Controller('designs/:id')
export class ReviewController {
  constructor(private readonly review: ReviewService) {}

  @Post('transitions')
  @HttpCode(200)
  @Roles('engineer', 'admin')
  @ApiOkResponse({ type: DesignDto })
  @ApiBadRequestResponse({ description: 'Back to draft without a comment' })
  @ApiForbiddenResponse({ description: 'Only the author submits; someone other than the author releases' })
  @ApiConflictResponse({ description: 'Not a transition of the review workflow, or no mounts chosen' })
  transition(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Body() dto: TransitionDto): Promise<DesignDto> {
    return this.review.transition(user, id, dto);
  }

  @Post('revisions')
  @Roles('engineer', 'admin')
  @ApiCreatedResponse({ type: DesignDto, description: 'A new draft revision (max revision of the name + 1)' })
  @ApiConflictResponse({ description: 'The design is not released or superseded' })
  startRevision(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<DesignDto> {
    return this.review.startRevision(user, id);
  }

  @Get('checkers')
  @Roles('engineer', 'admin')
  @ApiOkResponse({
    type: [UserRefDto],
    description: 'Who may be asked to check this design: active engineers and admins other than its author, by name',
  })
  checkers(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<UserRefDto[]> {
    return this.review.checkers(user, id);
  }

  @Get('history')
  @ApiOkResponse({ type: [HistoryEntryDto], description: 'Oldest first' })
  history(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<HistoryEntryDto[]> {
    return this.review.history(user, id);
  }
}
