import { Module } from '@nestjs/common';
import { CalibrationModule } from '../calibration/calibration.module';
import { ExchangeController } from './exchange.controller';
import { ExchangeRepository } from './exchange.repository';
import { ExchangeService } from './exchange.service';

@Module({
  imports: [CalibrationModule],
  controllers: [ExchangeController],
  providers: [ExchangeRepository, ExchangeService],
  exports: [ExchangeService],
})
export class ExchangeModule {}
