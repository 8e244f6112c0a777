import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Post, Req, Res } from '@nestjs/common';
import type { Request, Response } from 'express';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import { SessionDto } from '../auth/dto/auth.dto';
import { clientAddress, withRetryAfter } from '../auth/login-limiter/limited-request';
import { LoginLimiterService } from '../auth/login-limiter/login-limiter.service';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import {
  AcceptedInvitationDto,
  CreateInvitationDto,
  InvitationDto,
  InvitationPreviewDto,
  InvitationSentDto,
  InvitedSignUpDto,
} from './dto/invitation.dto';
import { InvitationsService } from './invitations.service';

const LINK_404 = 'unknown, used, revoked or expired link';

@ApiTags('invitations')
@Controller()
export class InvitationsController {
  constructor(
    private readonly invitations: InvitationsService,
    private readonly limiter: LoginLimiterService,
  ) {}

  @Post('farms/:farmId/invitations')
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Invite an e-mail address to the farm; the answer says whether the e-mail went' })
  @ApiCreatedResponse({ type: InvitationSentDto })
  invite(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIntPipe) farmId: number,
    @Body() body: CreateInvitationDto,
  ): Promise<InvitationSentDto> {
    return this.invitations.invite(me, farmId, body);
  }

  @Get('farms/:farmId/invitations')
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Pending invitations of the farm (owners)' })
  @ApiOkResponse({ type: InvitationDto, isArray: true })
  pending(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIntPipe) farmId: number,
  ): Promise<InvitationDto[]> {
    return this.invitations.pending(me, farmId);
  }

  @Delete('farms/:farmId/invitations/:invitationId')
  @ApiBearerAuth()
  @HttpCode(204)
  @ApiNoContentResponse()
  async revoke(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIntPipe) farmId: number,
    @Param('invitationId', ParseIntPipe) invitationId: number,
  ): Promise<void> {
    await this.invitations.revoke(me, farmId, invitationId);
  }

  @Post('farms/:farmId/invitations/:invitationId/resend')
  @ApiBearerAuth()
  @HttpCode(200)
  @ApiOperation({ summary: 'Send a new link (the old one stops working), valid 7 more days' })
  @ApiOkResponse({ type: InvitationSentDto })
  resend(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIntPipe) farmId: number,
    @Param('invitationId', ParseIntPipe) invitationId: number,
  ): Promise<InvitationSentDto> {
    return this.invitations.resend(me, farmId, invitationId);
  }

  @Public()
  @Get('invitations/:token')
  @ApiOperation({ summary: 'What an invitation link offers' })
  @ApiOkResponse({ type: InvitationPreviewDto })
  @ApiNotFoundResponse({ description: LINK_404 })
  preview(@Param('token') token: string): Promise<InvitationPreviewDto> {
    return this.invitations.preview(token);
  }

  @Public()
  @Post('invitations/:token/sign-up')
  @ApiOperation({ summary: 'Create an account with the invited address and join the farm' })
  @ApiCreatedResponse({ type: SessionDto })
  @ApiNotFoundResponse({ description: LINK_404 })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address' })
  signUp(
    @Param('token') token: string,
    @Body() body: InvitedSignUpDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionDto> {
    return withRetryAfter(response, async () => {
      await this.limiter.admitAction('invitation-sign-up', clientAddress(request));
      return this.invitations.signUp(token, body);
    });
  }

  @Post('invitations/:token/accept')
  @ApiBearerAuth()
  @HttpCode(200)
  @ApiOperation({ summary: 'Join the farm with the signed-in account (its address must be the invited one)' })
  @ApiOkResponse({ type: AcceptedInvitationDto })
  @ApiNotFoundResponse({ description: LINK_404 })
  accept(@CurrentUser() me: AuthenticatedUser, @Param('token') token: string): Promise<AcceptedInvitationDto> {
    return this.invitations.accept(me, token);
  }
}
