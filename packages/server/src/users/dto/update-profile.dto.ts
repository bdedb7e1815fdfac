import { PickType } from '@nestjs/swagger';
import { UpdateUserDto } from './update-user.dto.js';

/** What every user may change on their own account: the part of an admin's change that is theirs. */
export class UpdateProfileDto extends PickType(UpdateUserDto, ['name', 'unitSystem'] as const) {}
