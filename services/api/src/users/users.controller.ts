import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, Query } from '@nestjs/common';
import { IdParam } from '../common/pipes/id-param';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { Allow } from '../common/access/access.decorators';
import { Ctx, type SignedInContext } from '../common/context/request-context';
import { InviteUserDto, ListUsersQuery, UpdateUserDto, UserDto, UserPageDto } from './dto/user.dto';
import { UsersService } from './users.service';

@ApiTags('people')
@ApiBearerAuth()
@Controller('users')
@Allow('people.manage')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiOkResponse({ type: UserPageDto })
  list(@Query() query: ListUsersQuery): Promise<UserPageDto> {
    return this.users.list(query);
  }

  @Get(':id')
  @ApiOkResponse({ type: UserDto })
  get(@IdParam() id: number): Promise<UserDto> {
    return this.users.get(id);
  }

  @Post()
  @ApiCreatedResponse({
    type: UserDto,
    description: 'Invited; an e-mail with a single-use link is sent',
  })
  invite(@Body() body: InviteUserDto, @Ctx() context: SignedInContext): Promise<UserDto> {
    return this.users.invite(context, body);
  }

  @Patch(':id')
  @ApiOkResponse({ type: UserDto })
  update(
    @IdParam() id: number,
    @Body() body: UpdateUserDto,
    @Ctx() context: SignedInContext,
  ): Promise<UserDto> {
    return this.users.update(context, id, body);
  }

  @Post(':id/resend-invite')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'A new invitation link is sent; earlier ones stop working' })
  resendInvitation(@IdParam() id: number, @Ctx() context: SignedInContext): Promise<void> {
    return this.users.resendInvitation(context, id);
  }
}
