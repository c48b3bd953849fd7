import { Module } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { SequelizeModule } from '@nestjs/sequelize';
import { databaseConfig } from '../config/configuration';
import { ALL_MODELS } from './models';

/**
 * The connection. `autoLoadModels` stays off on purpose: with it on, @nestjs/sequelize authenticates at
 * boot and a database outage would stop the process; with it off, the app starts, liveness answers and
 * readiness reports the outage. The schema is never synchronised: migrations own it.
 */
@Module({
  imports: [
    SequelizeModule.forRootAsync({
      inject: [databaseConfig.KEY],
      useFactory: (database: ConfigType<typeof databaseConfig>) => ({
        dialect: 'postgres' as const,
        uri: database.url,
        models: ALL_MODELS,
        autoLoadModels: false,
        synchronize: false,
        logging: false,
        pool: { max: 10, min: 0, acquire: 10_000, idle: 10_000 },
        dialectOptions: { connectionTimeoutMillis: 3_000 },
        define: { underscored: true },
      }),
    }),
  ],
})
export class DatabaseModule {}
