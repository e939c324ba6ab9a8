import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MediaModule } from '../media/media.module';
import { BankCsvService } from './bank-csv.service';
import { BanksController } from './banks.controller';
import { BanksService } from './banks.service';
import { BankShareEntity } from './entities/bank-share.entity';
import { BankEntity } from './entities/bank.entity';
import { ItemEntity } from './entities/item.entity';
import { ItemsController } from './items.controller';
import { ItemsService } from './items.service';

@Module({
  imports: [TypeOrmModule.forFeature([BankEntity, BankShareEntity, ItemEntity]), MediaModule],
  controllers: [BanksController, ItemsController],
  providers: [BanksService, ItemsService, BankCsvService],
  exports: [BanksService],
})
export class BanksModule {}
