export { BanksModule } from './banks.module';
export { BanksService, type AccessibleBank } from './banks.service';
export { allows, type BankNeed } from './bank-access';
export { BANK_CSV_COLUMNS, itemToRow, rowToItem } from './csv/bank-csv';
export { buildItemContent, type ItemInput } from './item-content';
export { BankEntity } from './entities/bank.entity';
export { BankShareEntity } from './entities/bank-share.entity';
export { ItemEntity } from './entities/item.entity';
