import { Body, Controller, Get, Param, ParseIntPipe, Post, UploadedFile, UseFilters, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { DeleteUploadInterceptor } from '../catalog/import/upload.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { User } from '../users/user.entity.js';
import { CreateVerificationDto, TapTestRejectedDto, VerificationDto } from './dto/verification.dto.js';
import { FRF_QUANTITIES, VERIFICATION_KINDS } from './tap-test-file.js';
import { MAX_TAP_TEST_MB, TAP_TEST_UPLOAD_FIELD, TAP_TEST_UPLOAD_OPTIONS, TapTestTooLargeFilter } from './verification-upload.js';
import { VerificationsService, type UploadedTapTest } from './verifications.service.js';

/** As-built verification (tap tests) of released designs; visibility as for the design itself. */
@ApiTags('verifications')
@ApiBearerAuth()
@Controller('designs/:id/verifications')
export class VerificationsController {
  constructor(private readonly verifications: VerificationsService) {}

  @Get()
  @ApiOkResponse({ type: [VerificationDto], description: 'Every measurement of the design, newest first' })
  list(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<VerificationDto[]> {
    return this.verifications.list(user, id);
  }

  @Post()
  @Roles('engineer', 'admin')
  @UseFilters(TapTestTooLargeFilter)
  @UseInterceptors(FileInterceptor(TAP_TEST_UPLOAD_FIELD, TAP_TEST_UPLOAD_OPTIONS), DeleteUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: [TAP_TEST_UPLOAD_FIELD, 'kind'],
      properties: {
        [TAP_TEST_UPLOAD_FIELD]: {
          type: 'string',
          format: 'binary',
          description:
            'CSV: frequency_hz,real,imag or frequency_hz,magnitude,phase_deg (kind=frf); time_s,force_n,acceleration_m_s2 (kind=impact)',
        },
        kind: { type: 'string', enum: [...VERIFICATION_KINDS] },
        quantity: { type: 'string', enum: [...FRF_QUANTITIES], description: 'Required for kind=frf (SI units)' },
        tolerancePct: { type: 'number', minimum: 1, maximum: 50, default: 10 },
        note: { type: 'string', maxLength: 500 },
      },
    },
  })
  @ApiCreatedResponse({ type: VerificationDto, description: 'Analysed and recorded' })
  @ApiUnprocessableEntityResponse({
    type: TapTestRejectedDto,
    description: 'Nothing stored: the file has problems, or no resonance can be identified',
  })
  @ApiConflictResponse({ description: 'The design is not released or superseded' })
  @ApiPayloadTooLargeResponse({ description: `The file is larger than ${MAX_TAP_TEST_MB} MB` })
  @ApiBadRequestResponse({ description: 'No file, or bad fields' })
  create(
    @CurrentUser() user: User,
    @Param('id', ParseIntPipe) id: number,
    @Body() dto: CreateVerificationDto,
    @UploadedFile() file: UploadedTapTest | undefined,
  ): Promise<VerificationDto> {
    return this.verifications.create(user, id, dto, file);
  }
}
