/**
 * Jest-only stand-in for @nestjs/throttler (CommonJS, which ESM jest cannot load). It keeps
 * the module's shape and never limits; the real rate limit is tested over HTTP against the
 * running server.
 */
import { HttpException, HttpStatus, Injectable, Module, type CanActivate, type DynamicModule } from '@nestjs/common';

@Module({})
export class ThrottlerModule {
  static forRoot(): DynamicModule {
    return { module: ThrottlerModule, global: true };
  }

  static forRootAsync(): DynamicModule {
    return { module: ThrottlerModule, global: true };
  }
}

@Injectable()
export class ThrottlerGuard implements CanActivate {
  canActivate(): boolean {
    return true;
  }
}

export class ThrottlerException extends HttpException {
  constructor(message = 'ThrottlerException: Too Many Requests') {
    super(message, HttpStatus.TOO_MANY_REQUESTS);
  }
}

const noopDecorator = (): MethodDecorator & ClassDecorator => () => undefined;

export const Throttle = (_options?: unknown) => noopDecorator();
export const SkipThrottle = (_skip?: unknown) => noopDecorator();
export const seconds = (howMany: number): number => howMany * 1000;
export const minutes = (howMany: number): number => howMany * 60_000;
