import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { DatasetsModule } from '../datasets/datasets.module';
import { StoredResult } from './models/stored-result.model';
import { RegressionController } from './regression.controller';
import { RegressionService } from './regression.service';

@Module({
  imports: [SequelizeModule.forFeature([StoredResult]), DatasetsModule],
  controllers: [RegressionController],
  providers: [RegressionService],
})
export class RegressionModule {}
