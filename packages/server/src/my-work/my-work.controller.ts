import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import type { User } from '../users/user.entity.js';
import { MyWorkDto } from './dto/my-work.dto.js';
import { MyWorkService } from './my-work.service.js';

/** The caller's work list: the overview page starts with it. */
@ApiTags('review')
@ApiBearerAuth()
@Controller('my-work')
export class MyWorkController {
  constructor(private readonly work: MyWorkService) {}

  @Get()
  @ApiOkResponse({ type: MyWorkDto })
  get(@CurrentUser() user: User): Promise<MyWorkDto> {
    return this.work.forUser(user);
  }
}
