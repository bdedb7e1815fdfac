import { SelectionLimitDto } from '../../selection/dto/selection-request.dto.js';

/** Body of `POST /api/designs/:id/selection`: `{limit?}`. */
export class RunDesignSelectionDto extends SelectionLimitDto {}
