import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiProperty, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator.js';
import { AppConfig } from '../config/app-config.js';
import { HealthService } from './health.service.js';

class HealthDto {
  @ApiProperty({ enum: ['ok'] })
  status: 'ok';

  @ApiProperty({ description: 'Demo mode: demo accounts and data; the sign-in page mentions them only then' })
  demo: boolean;
}

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    private readonly health: HealthService,
    private readonly config: AppConfig,
  ) {}

  @Public()
  @Get()
  @ApiOkResponse({ type: HealthDto })
  @ApiServiceUnavailableResponse({ description: 'Database unavailable' })
  async check(): Promise<HealthDto> {
    return { ...(await this.health.check()), demo: this.config.demo };
  }
}
