import { Injectable, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import type { UnitSystem } from '@tacet/vibration';
import { map, type Observable } from 'rxjs';
import { wordsInReaderUnits } from './reader-words.js';

/** The unit system of the signed-in reader (SI for nobody signed in). */
export function readerUnitSystem(request: { user?: { unitSystem?: UnitSystem } }): UnitSystem {
  return request.user?.unitSystem === 'US' ? 'US' : 'SI';
}

/**
 * Writes the figure marks in the words of every JSON answer (reasons, notes, assumptions) in the
 * reader's unit system, the signed-in user's preference (reader-words.ts). Files are left alone:
 * their services write them for the reader themselves.
 */
@Injectable()
export class ReaderUnitsInterceptor implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const request = context.switchToHttp().getRequest<{ user?: { unitSystem?: UnitSystem } }>();
    return next.handle().pipe(map((body: unknown) => wordsInReaderUnits(body, readerUnitSystem(request))));
  }
}
