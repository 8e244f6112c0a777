import {
  Body,
  Controller,
  Delete,
  Get,
  Headers,
  HttpCode,
  Param,
  Patch,
  Post,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { ApiVersionedWrite, IF_MATCH_HEADER } from '../common/versioning';
import type { UploadedCsvFile } from '../temperature-logs/uploaded-file';
import {
  CreateFuelRecordDto,
  FuelRecordCsvInspectionDto,
  FuelRecordDto,
  FuelRecordsUploadResultDto,
  UpdateFuelRecordDto,
  UploadFuelRecordsDto,
} from './dto/fuel-record.dto';
import { FUEL_RECORD_CSV_MAX_BYTES } from './fuel-record-rules';
import { FuelRecordsService } from './fuel-records.service';

/** Memory storage; the size check in the service answers in words (multer's own limit is a little above it). */
const csvUpload = FileInterceptor('file', { limits: { fileSize: FUEL_RECORD_CSV_MAX_BYTES + 1, files: 1 } });
const fileSchema = {
  type: 'string',
  format: 'binary',
  description: `CSV file, UTF-8, at most ${FUEL_RECORD_CSV_MAX_BYTES / 1024} kB`,
};
const ROW_ERRORS =
  "a bad record or file: details name each row and field ('row 3.endDate') in the user's words; nothing is stored";

@ApiTags('fuel-records')
@ApiBearerAuth()
@Controller()
export class FuelRecordsController {
  constructor(private readonly records: FuelRecordsService) {}

  @Get('farms/:farmId/fuel-records')
  @ApiOperation({ summary: "The farm's fuel bills and tank deliveries, oldest first (farm:read)" })
  @ApiOkResponse({ type: FuelRecordDto, isArray: true })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  list(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<FuelRecordDto[]> {
    return this.records.list(me, farmId);
  }

  @Post('farms/:farmId/fuel-records')
  @ApiOperation({ summary: 'Add a fuel bill or tank delivery (house:write)' })
  @ApiCreatedResponse({ type: FuelRecordDto })
  @ApiBadRequestResponse({ description: ROW_ERRORS })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  create(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Body() body: CreateFuelRecordDto,
  ): Promise<FuelRecordDto> {
    return this.records.create(me, farmId, body);
  }

  @Patch('fuel-records/:recordId')
  @ApiOperation({ summary: 'Change a fuel record (house:write)' })
  @ApiOkResponse({ type: FuelRecordDto })
  @ApiVersionedWrite('fuel record')
  @ApiBadRequestResponse({ description: ROW_ERRORS })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such record, or not a member of its farm' })
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('recordId', ParseIdPipe) recordId: number,
    @Body() body: UpdateFuelRecordDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<FuelRecordDto> {
    return this.records.update(me, recordId, body, ifMatch);
  }

  @Delete('fuel-records/:recordId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a fuel record (house:write)' })
  @ApiNoContentResponse()
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such record, or not a member of its farm' })
  async remove(@CurrentUser() me: AuthenticatedUser, @Param('recordId', ParseIdPipe) recordId: number): Promise<void> {
    await this.records.remove(me, recordId);
  }

  @Post('farms/:farmId/fuel-records/inspect')
  @HttpCode(200)
  @UseInterceptors(csvUpload)
  @ApiOperation({ summary: 'Read a fuel-record CSV and propose which columns hold what; stores nothing (house:write)' })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: fileSchema } } })
  @ApiOkResponse({ type: FuelRecordCsvInspectionDto })
  @ApiBadRequestResponse({ description: 'no file, or the file cannot be read' })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  inspect(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @UploadedFile() file: UploadedCsvFile | undefined,
  ): Promise<FuelRecordCsvInspectionDto> {
    return this.records.inspect(me, farmId, file);
  }

  @Post('farms/:farmId/fuel-records/upload')
  @UseInterceptors(csvUpload)
  @ApiOperation({
    summary:
      'Store every row of a fuel-record CSV read with the confirmed columns; nothing is stored when any row is bad (house:write)',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'mapping'],
      properties: {
        file: fileSchema,
        mapping: { type: 'string', description: 'FuelRecordColumnMappingDto as JSON' },
      },
    },
  })
  @ApiCreatedResponse({ type: FuelRecordsUploadResultDto })
  @ApiBadRequestResponse({ description: ROW_ERRORS })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  upload(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @UploadedFile() file: UploadedCsvFile | undefined,
    @Body() body: UploadFuelRecordsDto,
  ): Promise<FuelRecordsUploadResultDto> {
    return this.records.upload(me, farmId, file, body.mapping);
  }
}
