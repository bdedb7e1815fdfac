import { PartialType } from '@nestjs/swagger';
import { CreateMountDto } from './create-mount.dto.js';
import { MountField } from './mount-fields.js';

/**
 * A partial change: every field of a new mount, optional. `null` clears an optional field and
 * is refused for the others (`skipNullProperties: false`; the nullable fields carry their own
 * `@IsOptional()`). Setting dampingRatio (or lossFactor) alone switches the damping model: the
 * other one is cleared.
 */
export class UpdateMountDto extends PartialType(CreateMountDto, { skipNullProperties: false }) {
  @MountField('active')
  active?: boolean;
}
