import { type DynamicModule, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { CqrsModule } from '@nestjs/cqrs';
import { AuthModule } from './auth/auth.module.js';
import { JwtAuthGuard } from './auth/jwt-auth.guard.js';
import { AuthzModule } from './authz/authz.module.js';
import { PoliciesGuard } from './authz/policies.guard.js';
import { BranchesModule } from './branches/branches.module.js';
import { CardProcessorModule } from './card-processor/card-processor.module.js';
import { CatalogueModule } from './catalogue/catalogue.module.js';
import { ClientsModule } from './clients/clients.module.js';
import { CompareModule } from './compare/compare.module.js';
import { DayCloseModule } from './day-close/day-close.module.js';
import { MailModule } from './mail/mail.module.js';
import { PayrollModule } from './payroll/payroll.module.js';
import { StaffModule } from './staff/staff.module.js';
import { TicketsModule } from './tickets/tickets.module.js';
import { parseConfig } from './config.js';
import { DatabaseModule } from './database/database.module.js';
import { EventsModule } from './events/events.module.js';
import { HealthModule } from './health/health.module.js';
import { OrganisationModule } from './organisation/organisation.module.js';
import { SeedModule } from './seed/seed.module.js';

const features = [
  CqrsModule.forRoot(),
  DatabaseModule,
  EventsModule,
  AuthzModule,
  AuthModule,
  HealthModule,
  OrganisationModule,
  BranchesModule,
  CatalogueModule,
  StaffModule,
  ClientsModule,
  CardProcessorModule,
  MailModule,
  TicketsModule,
  DayCloseModule,
  PayrollModule,
  SeedModule,
  // After SeedModule: its start-up build of the comparison's read models sees what the seed loaded.
  CompareModule,
];

/** The whole API; `register` reads the environment it is given once, so each test app gets its own settings. */
@Module({
  providers: [
    { provide: APP_GUARD, useClass: JwtAuthGuard },
  { provide: APP_GUARD, useClass: PoliciesGuard },
  ],
})
export class AppModule {
  static register(env: NodeJS.ProcessEnv = process.env): DynamicModule {
    const config = parseConfig(env);
    return {
      module: AppModule,
    imports: [ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, load: [() => config] }), ...features],
  };
  }
}
