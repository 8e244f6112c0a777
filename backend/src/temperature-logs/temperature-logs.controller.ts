import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import {
  Body,
  CallHandler,
  Controller,
  Delete,
  ExecutionContext,
  Get,
  HttpCode,
  Injectable,
  NestInterceptor,
  Param,
  PayloadTooLargeException,
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
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { catchError, throwError, type Observable } from 'rxjs';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { TEMPERATURE_LOG_MAX_BYTES } from './csv/temperature-log-csv';
import {
  TemperatureCsvInspectionDto,
  TemperatureLogDetailDto,
  TemperatureLogDto,
  UploadTemperatureLogDto,
} from './dto/temperature-log.dto';
import { TemperatureLogsService } from './temperature-logs.service';
import type { UploadedCsvFile } from './uploaded-file';

const MAX_MB = TEMPERATURE_LOG_MAX_BYTES / 1024 / 1024;

/** Replaces multer's terse 'File too large' with the limit, in words. */
@Injectable()
class FileTooLargeMessage implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next
      .handle()
      .pipe(
        catchError((error: unknown) =>
          throwError(() =>
            error instanceof PayloadTooLargeException
              ? new PayloadTooLargeException(`the file is larger than ${MAX_MB} MB; split the log into shorter periods`)
              : error,
          ),
        ),
      );
  }
}

/** Memory storage (the file is read once and never written to disk), one file, size-limited. */
const csvUpload = FileInterceptor('file', { limits: { fileSize: TEMPERATURE_LOG_MAX_BYTES, files: 1 } });

const fileSchema = { type: 'string', format: 'binary', description: `CSV file, UTF-8, at most ${MAX_MB} MB` };
const LINE_ERRORS =
  "the file cannot be read: not UTF-8, empty, unknown columns or bad rows; details = [{ field: 'line 12', message }] (field 'file' for the file as a whole)";

@ApiTags('temperature-logs')
@ApiBearerAuth()
@Controller()
export class TemperatureLogsController {
  constructor(private readonly logs: TemperatureLogsService) {}

  @Post('farms/:farmId/temperature-logs/inspect')
  @HttpCode(200)
  @UseInterceptors(FileTooLargeMessage, csvUpload)
  @ApiOperation({
    summary: 'Read the start of a temperature CSV and propose which columns hold what; stores nothing (house:write)',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: fileSchema } } })
  @ApiOkResponse({ type: TemperatureCsvInspectionDto })
  @ApiBadRequestResponse({ description: 'no file part' })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  @ApiPayloadTooLargeResponse({ description: `file over ${MAX_MB} MB` })
  @ApiUnprocessableEntityResponse({ description: LINE_ERRORS })
  inspect(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @UploadedFile() file: UploadedCsvFile | undefined,
  ): Promise<TemperatureCsvInspectionDto> {
    return this.logs.inspect(me, farmId, file);
  }

  @Post('farms/:farmId/temperature-logs')
  @UseInterceptors(FileTooLargeMessage, csvUpload)
  @ApiOperation({
    summary:
      'Store a temperature log read with the confirmed column mapping; nothing is stored when any row is bad (house:write)',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'name', 'mapping'],
      properties: {
        file: fileSchema,
        name: { type: 'string', maxLength: 200 },
        mapping: {
          type: 'string',
          description:
            'TemperatureColumnMappingDto as JSON, e.g. {"timestampColumn":"Time","temperatureColumn":"Temp (°C)","unit":"C"}',
        },
      },
    },
  })
  @ApiCreatedResponse({ type: TemperatureLogDto })
  @ApiBadRequestResponse({
    description: 'no file part, or name/mapping invalid (details per field, mapping.* for the mapping)',
  })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  @ApiPayloadTooLargeResponse({ description: `file over ${MAX_MB} MB` })
  @ApiUnprocessableEntityResponse({ description: LINE_ERRORS })
  upload(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @UploadedFile() file: UploadedCsvFile | undefined,
    @Body() body: UploadTemperatureLogDto,
  ): Promise<TemperatureLogDto> {
    return this.logs.upload(me, farmId, file, body);
  }

  @Get('farms/:farmId/temperature-logs')
  @ApiOperation({ summary: "The farm's temperature logs, newest first, without readings (farm:read)" })
  @ApiOkResponse({ type: TemperatureLogDto, isArray: true })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  list(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
  ): Promise<TemperatureLogDto[]> {
    return this.logs.list(me, farmId);
  }

  @Get('temperature-logs/:logId')
  @ApiOperation({
    summary: 'A temperature log with one row per day (hourly readings reduced to min/mean/max) (farm:read)',
  })
  @ApiOkResponse({ type: TemperatureLogDetailDto })
  @ApiNotFoundResponse({ description: 'no such log, or not a member of its farm' })
  get(
    @CurrentUser() me: AuthenticatedUser,
    @Param('logId', ParseIdPipe) logId: number,
  ): Promise<TemperatureLogDetailDto> {
    return this.logs.get(me, logId);
  }

  @Delete('temperature-logs/:logId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a temperature log (house:write)' })
  @ApiNoContentResponse()
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such log, or not a member of its farm' })
  async remove(@CurrentUser() me: AuthenticatedUser, @Param('logId', ParseIdPipe) logId: number): Promise<void> {
    await this.logs.remove(me, logId);
  }
}
