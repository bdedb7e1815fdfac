import { Body, Controller, Get, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateSupplierDto } from './dto/create-supplier.dto.js';
import { SupplierDto } from './dto/supplier.dto.js';
import { UpdateSupplierDto } from './dto/update-supplier.dto.js';
import { SuppliersService, type SupplierWithCount } from './suppliers.service.js';

const toDto = ({ supplier, mountCount }: SupplierWithCount) => SupplierDto.from(supplier, mountCount);

/** Suppliers: any signed-in role reads them; catalog managers and admins change them. */
@ApiTags('suppliers')
@ApiBearerAuth()
@Controller('suppliers')
export class SuppliersController {
  constructor(private readonly suppliers: SuppliersService) {}

  @Get()
  @ApiOkResponse({ type: [SupplierDto], description: 'Every supplier (retired ones too), sorted by name' })
  async findAll(): Promise<SupplierDto[]> {
    return (await this.suppliers.findAll()).map(toDto);
  }

  @Post()
  @Roles('catalog_manager', 'admin')
  @ApiCreatedResponse({ type: SupplierDto })
  @ApiBadRequestResponse({ description: 'Invalid fields' })
  @ApiConflictResponse({ description: 'A supplier with this name already exists' })
  async create(@Body() dto: CreateSupplierDto): Promise<SupplierDto> {
    return toDto(await this.suppliers.create(dto));
  }

  @Get(':id')
  @ApiOkResponse({ type: SupplierDto })
  @ApiNotFoundResponse({ description: 'Supplier not found' })
  async findOne(@Param('id', ParseIntPipe) id: number): Promise<SupplierDto> {
    return toDto(await this.suppliers.findOne(id));
  }

  @Patch(':id')
  @Roles('catalog_manager', 'admin')
  @ApiOkResponse({ type: SupplierDto })
  @ApiBadRequestResponse({ description: 'Invalid fields' })
  @ApiConflictResponse({ description: 'A supplier with this name already exists' })
  async update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateSupplierDto): Promise<SupplierDto> {
    return toDto(await this.suppliers.update(id, dto));
  }
}
