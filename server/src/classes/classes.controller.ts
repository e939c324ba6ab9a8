import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Patch, Post, Query, UploadedFile } from '@nestjs/common';
import type { ClassDetailDto, ClassDto, ImportResultDto, PairRuleDto, RosterEntryDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { CSV_MAX_BYTES } from '../media/csv-table';
import { requireFile, SingleFileUpload, type UploadedBuffer } from '../media/uploads';
import { UserEntity } from '../users/entities/user.entity';
import { ClassesService } from './classes.service';
import {
  AddCoTeacherDto,
  CreateClassDto,
  CreatePairRuleDto,
  CreateRosterEntryDto,
  ImportRosterDto,
  ListClassesQueryDto,
  UpdateClassDto,
  UpdateRosterEntryDto,
} from './dto/class.dto';
import { RosterService } from './roster.service';

const uuid = () => new ParseUUIDPipe();

/** Classes: the owner edits; co-teachers and same-school admins read (ClassesService.access). */
@Controller('classes')
export class ClassesController {
  constructor(
    private readonly classes: ClassesService,
    private readonly roster: RosterService,
  ) {}

  @Get()
  list(@CurrentUser() user: UserEntity, @Query() query: ListClassesQueryDto): Promise<ClassDto[]> {
    return this.classes.list(user, query);
  }

  @Post()
  @HttpCode(HttpStatus.CREATED)
  create(@CurrentUser() user: UserEntity, @Body() dto: CreateClassDto): Promise<ClassDetailDto> {
    return this.classes.create(user, dto);
  }

  @Get(':id')
  detail(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<ClassDetailDto> {
    return this.classes.detail(user, id);
  }

  @Patch(':id')
  update(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: UpdateClassDto): Promise<ClassDetailDto> {
    return this.classes.update(user, id, dto);
  }

  @Post(':id/archive')
  @HttpCode(HttpStatus.OK)
  archive(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<ClassDetailDto> {
    return this.classes.setArchived(user, id, true);
  }

  @Post(':id/unarchive')
  @HttpCode(HttpStatus.OK)
  unarchive(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<ClassDetailDto> {
    return this.classes.setArchived(user, id, false);
  }

  @Post(':id/co-teachers')
  @HttpCode(HttpStatus.OK)
  addCoTeacher(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: AddCoTeacherDto): Promise<ClassDetailDto> {
    return this.classes.addCoTeacher(user, id, dto);
  }

  @Delete(':id/co-teachers/:userId')
  @HttpCode(HttpStatus.NO_CONTENT)
  removeCoTeacher(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('userId', uuid()) userId: string): Promise<void> {
    return this.classes.removeCoTeacher(user, id, userId);
  }

  @Get(':id/roster')
  listRoster(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<RosterEntryDto[]> {
    return this.roster.list(user, id);
  }

  @Post(':id/roster')
  @HttpCode(HttpStatus.CREATED)
  addEntry(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: CreateRosterEntryDto): Promise<RosterEntryDto> {
    return this.roster.create(user, id, dto);
  }

  @Post(':id/roster/import')
  @HttpCode(HttpStatus.OK)
  @SingleFileUpload(CSV_MAX_BYTES, 'CSV file')
  importRoster(
    @CurrentUser() user: UserEntity,
    @Param('id', uuid()) id: string,
    @UploadedFile() file: UploadedBuffer | undefined,
    @Body() dto: ImportRosterDto,
  ): Promise<ImportResultDto> {
    return this.roster.importCsv(user, id, requireFile(file, 'CSV file').buffer, dto.mode ?? 'append');
  }

  @Patch(':id/roster/:entryId')
  updateEntry(
    @CurrentUser() user: UserEntity,
    @Param('id', uuid()) id: string,
    @Param('entryId', uuid()) entryId: string,
    @Body() dto: UpdateRosterEntryDto,
  ): Promise<RosterEntryDto> {
    return this.roster.update(user, id, entryId, dto);
  }

  @Delete(':id/roster/:entryId')
  @HttpCode(HttpStatus.NO_CONTENT)
  removeEntry(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('entryId', uuid()) entryId: string): Promise<void> {
    return this.roster.remove(user, id, entryId);
  }

  @Get(':id/pairs')
  listPairs(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<PairRuleDto[]> {
    return this.roster.listPairs(user, id);
  }

  @Post(':id/pairs')
  @HttpCode(HttpStatus.CREATED)
  addPair(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Body() dto: CreatePairRuleDto): Promise<PairRuleDto> {
    return this.roster.addPair(user, id, dto);
  }

  @Delete(':id/pairs/:pairId')
  @HttpCode(HttpStatus.NO_CONTENT)
  removePair(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('pairId', uuid()) pairId: string): Promise<void> {
    return this.roster.removePair(user, id, pairId);
  }
}
