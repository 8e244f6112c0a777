import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Res } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { contentDisposition } from '../mail/mail.controller';
import {
  ClientFarmDto,
  CreateReportDto,
  ReportDto,
  ReportSentDto,
  ReportSummaryDto,
  SendReportDto,
  UpdateReportDto,
} from './dto/report.dto';
import { ReportsService } from './reports.service';

@ApiTags('reports')
@ApiBearerAuth()
@Controller()
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Post('houses/:houseId/reports')
  @ApiOperation({ summary: 'Create a heater-sizing report: saves a snapshot of the inputs and results (report:write)' })
  @ApiCreatedResponse({ type: ReportDto })
  create(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIntPipe) houseId: number,
    @Body() body: CreateReportDto,
  ): Promise<ReportDto> {
    return this.reports.create(me, houseId, body);
  }

  @Get('houses/:houseId/reports')
  @ApiOkResponse({ type: ReportSummaryDto, isArray: true })
  listForHouse(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIntPipe) houseId: number,
  ): Promise<ReportSummaryDto[]> {
    return this.reports.listForHouse(me, houseId);
  }

  @Get('farms/:farmId/reports')
  @ApiOkResponse({ type: ReportSummaryDto, isArray: true })
  listForFarm(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIntPipe) farmId: number,
  ): Promise<ReportSummaryDto[]> {
    return this.reports.listForFarm(me, farmId);
  }

  @Get('advising')
  @ApiOperation({ summary: "The signed-in adviser's client farms, each with its newest report" })
  @ApiOkResponse({ type: ClientFarmDto, isArray: true })
  clientFarms(@CurrentUser() me: AuthenticatedUser): Promise<ClientFarmDto[]> {
    return this.reports.clientFarms(me);
  }

  @Get('reports/:reportId.pdf')
  @ApiOperation({ summary: "The report as PDF, in the reader's units (A4 for SI, US Letter for US)" })
  @ApiProduces('application/pdf')
  @ApiOkResponse({ description: 'the PDF' })
  async pdf(
    @CurrentUser() me: AuthenticatedUser,
    @Param('reportId', ParseIntPipe) reportId: number,
    @Res() response: Response,
  ): Promise<void> {
    const { fileName, content } = await this.reports.pdf(me, reportId);
    response.setHeader('Content-Type', 'application/pdf');
    response.setHeader('Content-Disposition', contentDisposition(fileName));
    response.setHeader('Content-Length', String(content.length));
    response.end(content);
  }

  @Get('reports/:reportId')
  @ApiOkResponse({ type: ReportDto })
  get(@CurrentUser() me: AuthenticatedUser, @Param('reportId', ParseIntPipe) reportId: number): Promise<ReportDto> {
    return this.reports.get(me, reportId);
  }

  @Patch('reports/:reportId')
  @ApiOperation({ summary: 'Edit a draft report (an issued one is read-only)' })
  @ApiOkResponse({ type: ReportDto })
  @ApiConflictResponse({ description: 'the report is issued' })
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('reportId', ParseIntPipe) reportId: number,
    @Body() body: UpdateReportDto,
  ): Promise<ReportDto> {
    return this.reports.update(me, reportId, body);
  }

  @Post('reports/:reportId/issue')
  @HttpCode(200)
  @ApiOkResponse({ type: ReportDto })
  issue(@CurrentUser() me: AuthenticatedUser, @Param('reportId', ParseIntPipe) reportId: number): Promise<ReportDto> {
    return this.reports.issue(me, reportId);
  }

  @Post('reports/:reportId/revisions')
  @ApiOperation({ summary: 'Start a new revision: a draft copy of the report' })
  @ApiCreatedResponse({ type: ReportDto })
  revise(@CurrentUser() me: AuthenticatedUser, @Param('reportId', ParseIntPipe) reportId: number): Promise<ReportDto> {
    return this.reports.revise(me, reportId);
  }

  @Post('reports/:reportId/send')
  @HttpCode(200)
  @ApiOperation({ summary: 'E-mail the PDF to chosen farm members or addresses; says whether the send failed' })
  @ApiOkResponse({ type: ReportSentDto })
  send(
    @CurrentUser() me: AuthenticatedUser,
    @Param('reportId', ParseIntPipe) reportId: number,
    @Body() body: SendReportDto,
  ): Promise<ReportSentDto> {
    return this.reports.send(me, reportId, body);
  }
}
