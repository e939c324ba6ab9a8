import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post, Put } from '@nestjs/common';
import type { ItemDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { ItemInputDto, ReorderItemsDto } from './dto/item.dto';
import { ItemsService } from './items.service';

const uuid = () => new ParseUUIDPipe();

/** Items of one bank: read with any access, write with owner or edit access. */
@Controller('banks/:bankId/items')
export class ItemsController {
  constructor(private readonly items: ItemsService) {}

  @Get()
  list(@CurrentUser() user: UserEntity, @Param('bankId', uuid()) bankId: string): Promise<ItemDto[]> {
    return this.items.list(user, bankId);
  }

  @Post()
  @HttpCode(HttpStatus.CREATED)
  create(@CurrentUser() user: UserEntity, @Param('bankId', uuid()) bankId: string, @Body() dto: ItemInputDto): Promise<ItemDto> {
    return this.items.create(user, bankId, dto);
  }

  // Declared before ':itemId' so "order" is not read as an item id.
  @Put('order')
  reorder(@CurrentUser() user: UserEntity, @Param('bankId', uuid()) bankId: string, @Body() dto: ReorderItemsDto): Promise<ItemDto[]> {
    return this.items.reorder(user, bankId, dto.itemIds);
  }

  @Get(':itemId')
  get(@CurrentUser() user: UserEntity, @Param('bankId', uuid()) bankId: string, @Param('itemId', uuid()) itemId: string): Promise<ItemDto> {
    return this.items.get(user, bankId, itemId);
  }

  @Put(':itemId')
  update(
    @CurrentUser() user: UserEntity,
    @Param('bankId', uuid()) bankId: string,
    @Param('itemId', uuid()) itemId: string,
    @Body() dto: ItemInputDto,
  ): Promise<ItemDto> {
    return this.items.update(user, bankId, itemId, dto);
  }

  @Delete(':itemId')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: UserEntity, @Param('bankId', uuid()) bankId: string, @Param('itemId', uuid()) itemId: string): Promise<void> {
    return this.items.remove(user, bankId, itemId);
  }
}
