import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LoggerModule } from 'nestjs-pino';
import { DataSource } from 'typeorm';
import { AccessModule } from './access/access.module';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { BookingsModule } from './bookings/bookings.module';
import { AccessGuard } from './auth/guards/access.guard';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import { PostgresThrottlerStorage } from './common/throttling/postgres-throttler-storage';
import { validateEnvironment, type AppConfig } from './config/environment';
import { loggerParams } from './config/logger';
import { typeormOptions } from './database/typeorm-options';
import { CustomersModule } from './customers/customers.module';
import { DevModule } from './dev/dev.module';
import { GeocodingModule } from './geocoding/geocoding.module';
import { HealthModule } from './health/health.module';
import { ImportsModule } from './imports/imports.module';
import { InvoiceDocumentsModule } from './invoices/documents/invoice-documents.module';
import { InvoicesModule } from './invoices/invoices.module';
import { InvoiceExportModule } from './invoices/export/invoice-export.module';
import { InvoiceRemindersModule } from './invoices/reminders/invoice-reminders.module';
import { StatementsModule } from './invoices/statements/statements.module';
import { PaymentsModule } from './payments/payments.module';
import { JobsModule } from './jobs/jobs.module';
import { MailModule } from './mail/mail.module';
import { RatesModule } from './rates/rates.module';
import { ReportsModule } from './reports/reports.module';
import { CalendarModule } from './route-days/calendar/calendar.module';
import { VisitNoticesModule } from './route-days/notices/visit-notices.module';
import { RouteDaysModule } from './route-days/route-days.module';
import { ShearsModule } from './shears/shears.module';
import { StopsModule } from './stops/stops.module';
import { TicketsModule } from './tickets/tickets.module';
import { UsersModule } from './users/users.module';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnvironment }),
    LoggerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => loggerParams(config.get('LOG_LEVEL', { infer: true })),
    }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => ({
        ...typeormOptions(config.get('DATABASE_URL', { infer: true })),
        entities: [],
        autoLoadEntities: true,
      }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [ConfigService, DataSource],
      useFactory: (config: ConfigService<AppConfig, true>, dataSource: DataSource) => ({
        throttlers: [{ name: 'auth', ttl: 60_000, limit: config.get('AUTH_RATE_LIMIT', { infer: true }) }],
        errorMessage: 'Too many attempts. Wait a minute and try again.',
        storage: new PostgresThrottlerStorage(dataSource),
      }),
    }),
    ServeStaticModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => {
        const rootPath = config.get('CLIENT_DIST', { infer: true });
        return rootPath ? [{ rootPath, exclude: ['/api/{*path}'] }] : [];
      },
    }),
    MailModule,
    UsersModule,
    AuthModule,
    HealthModule,
    DevModule,
    RatesModule,
    AccessModule,
    StopsModule,
    CustomersModule,
    ShearsModule,
    GeocodingModule,
    ImportsModule,
    JobsModule,
    VisitNoticesModule,
    CalendarModule,
    BookingsModule,
    TicketsModule,
    // Before InvoicesModule: GET invoices/export.csv is a literal path that must match before invoices/:id.
    InvoiceExportModule,
    InvoicesModule,
    InvoiceRemindersModule,
    StatementsModule,
    InvoiceDocumentsModule,
    PaymentsModule,
    AuditModule,
    ReportsModule,
    // Last: the notices and calendar routes under /route-days/ are literal paths that must match before :id.
    RouteDaysModule,
  ],
  providers: [
    { provide: APP_GUARD, useClass: AccessGuard },
    { provide: APP_FILTER, useClass: AllExceptionsFilter },
  ],
})
export class AppModule {}
