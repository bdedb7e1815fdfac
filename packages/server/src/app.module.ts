import { Module, type DynamicModule } from '@nestjs/common';
import { AuthModule } from './auth/auth.module.js';
import { CatalogModule } from './catalog/catalog.module.js';
import type { AppConfig } from './config/app-config.js';
import { AppConfigModule } from './config/app-config.module.js';
import { DatabaseModule } from './database/database.module.js';
import { DemoModule } from './demo/demo.module.js';
import { DesignsModule } from './designs/designs.module.js';
import { HealthModule } from './health/health.module.js';
import { MailModule } from './mail/mail.module.js';
import { MyWorkModule } from './my-work/my-work.module.js';
import { PurchasingModule } from './purchasing/purchasing.module.js';
import { ReviewModule } from './review/review.module.js';
import { ProjectsModule } from './projects/projects.module.js';
import { SelectionModule } from './selection/selection.module.js';
import { SuppliersModule } from './suppliers/suppliers.module.js';
import { UsersModule } from './users/users.module.js';
import { VerificationsModule } from './verifications/verifications.module.js';
import { webClientModules } from './web-client.js';

/** The whole application for one resolved configuration (see `loadConfig`). */
@Module({})
export class AppModule {
  static forRoot(config: AppConfig): DynamicModule {
    return {
      module: AppModule,
      imports: [
        AppConfigModule.forRoot(config),
        DatabaseModule,
        UsersModule,
        AuthModule,
        HealthModule,
        MailModule,
        SuppliersModule,
        CatalogModule,
        ProjectsModule,
        SelectionModule,
        DesignsModule,
        ReviewModule,
        VerificationsModule,
        PurchasingModule,
        MyWorkModule,
        DemoModule,
        ...webClientModules(config.webDist),
      ],
    };
  }
}
