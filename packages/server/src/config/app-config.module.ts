import { Global, Module, type DynamicModule } from '@nestjs/common';
import { AppConfig } from './app-config.js';

/** Makes the resolved `AppConfig` injectable everywhere. */
@Global()
@Module({})
export class AppConfigModule {
  static forRoot(config: AppConfig): DynamicModule {
    return {
      module: AppConfigModule,
      providers: [{ provide: AppConfig, useValue: config }],
      exports: [AppConfig],
    };
  }
}
