import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { withoutStaffNotes } from '../access/staff-notes';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CustomersService } from './customers.service';
import { CreateCustomerDto } from './dto/create-customer.dto';
import { CustomerDetailDto, CustomerListDto } from './dto/customer-response.dto';
import { ListCustomersQueryDto } from './dto/list-customers-query.dto';
import { UpdateCustomerDto } from './dto/update-customer.dto';

@ApiTags('customers')
@ApiBearerAuth()
@Controller('customers')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  /** Sharpeners see the customers at their stops; clients their own record, or their shop's as its manager. */
  @Roles('owner', 'office', 'sharpener', 'client')
  @Get()
  list(@CurrentUser() actor: Actor, @Query() query: ListCustomersQueryDto): Promise<CustomerListDto> {
    return this.customers.list(actor, query);
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get(':id')
  async get(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<CustomerDetailDto> {
    return withoutStaffNotes(actor, await this.customers.get(actor, id));
  }

  @Roles('owner', 'office')
  @Post()
  create(@CurrentUser() actor: Actor, @Body() dto: CreateCustomerDto): Promise<CustomerDetailDto> {
    return this.customers.create(actor, dto);
  }

  @Roles('owner', 'office')
  @Patch(':id')
  update(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateCustomerDto,
  ): Promise<CustomerDetailDto> {
    return this.customers.update(actor, id, dto);
  }
}
