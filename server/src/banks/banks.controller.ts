import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Patch, Post, Query, Res, StreamableFile, UploadedFile } from '@nestjs/common';
import type { Response } from 'express';
import type { BankDetailDto, BankDto, ImportResultDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { CSV_MAX_BYTES } from '../media/csv-table';
import { requireFile, SingleFileUpload, type UploadedBuffer } from '../media/uploads';
import { UserEntity } from '../users/entities/user.entity';
import { BankCsvService } from './bank-csv.service';
import { BanksService } from './banks.service';
import { CreateBankDto, DuplicateBankDto, ImportBankDto, ListBanksQueryDto, ShareBankDto, UpdateBankDto } from './dto/bank.dto';

const uuid = () => new ParseUUIDPipe();

/** Banks: any signed-in staff member for their own; shares and same-school admins per BanksService.access. */
@Controller('banks')
export class BanksController {
  constructor(
    private readonly banks: BanksService,
    private readonly csv: BankCsvService,
  ) {}

  @Get()
  list(@CurrentUser() user: UserEntity, @Query() query: ListBanksQueryDto): Promise<BankDto[]> {
    return this.banks.list(user, query);
  }

  @Post()
  @HttpCode(HttpStatus.CREATED)
  async create(@CurrentUser() user: UserEntity, @Body() dto: CreateBankDto): Promise<BankDto> {
    const bank = await this.banks.create(user, dto);
    return this.banks.summary(user, bank.id);
  }

  @Post('import')
  @HttpCode(HttpStatus.CREATED)
  @SingleFileUpload(CSV_MAX_BYTES, 'CSV file')
  importNew(
    @CurrentUser() user: UserEntity,
    @UploadedFile() file: UploadedBuffer | undefined,
    @Body() dto: ImportBankDto,
  ): Promise<ImportResultDto> {
    const csv = requireFile(file, 'CSV file');
    return this.csv.importNewBank(user, csv.buffer, csv.originalname, dto.title);
  }

  @Get(':id')
  detail(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<BankDetailDto> {
    return this.banks.detail(user, id);
  }

  @Patch(':id')
  update(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: UpdateBankDto): Promise<BankDto> {
    return this.banks.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<void> {
    return this.banks.remove(user, id);
  }

  @Post(':id/archive')
  @HttpCode(HttpStatus.OK)
  archive(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<BankDto> {
    return this.banks.setArchived(user, id, true);
  }

  @Post(':id/unarchive')
  @HttpCode(HttpStatus.OK)
  unarchive(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<BankDto> {
    return this.banks.setArchived(user, id, false);
  }

  @Post(':id/duplicate')
  @HttpCode(HttpStatus.CREATED)
  duplicate(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: DuplicateBankDto): Promise<BankDto> {
    return this.banks.duplicate(user, id, dto);
  }

  @Post(':id/shares')
  @HttpCode(HttpStatus.OK)
  share(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: ShareBankDto): Promise<BankDetailDto> {
    return this.banks.share(user, id, dto);
  }

  @Delete(':id/shares/:userId')
  @HttpCode(HttpStatus.NO_CONTENT)
  unshare(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('userId', uuid()) userId: string): Promise<void> {
    return this.banks.unshare(user, id, userId);
  }

  @Get(':id/export')
  async export(
    @CurrentUser() user: UserEntity,
    @Param('id', uuid()) id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const { csv, fileName } = await this.csv.exportBank(user, id);
    res.setHeader('Cache-Control', 'no-store');
    return new StreamableFile(Buffer.from(csv, 'utf8'), { type: 'text/csv; charset=utf-8', disposition: `attachment; filename="${fileName}"` });
  }

  @Post(':id/items/import')
  @HttpCode(HttpStatus.OK)
  @SingleFileUpload(CSV_MAX_BYTES, 'CSV file')
  importInto(
    @CurrentUser() user: UserEntity,
    @Param('id', uuid()) id: string,
    @UploadedFile() file: UploadedBuffer | undefined,
  ): Promise<ImportResultDto> {
    return this.csv.importIntoBank(user, id, requireFile(file, 'CSV file').buffer);
  }
}
