import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsEmail, IsInt, IsString, Length, MaxLength } from 'class-validator';
import { Omittable } from '../../common/validation';
import { MailOutcomeDto } from '../../mail/dto/mail.dto';

export const REPORT_TEXT_MAX = 20_000;

export class CreateReportDto {
  @ApiProperty({ example: 'Heater sizing, north house' }) @IsString() @Length(1, 200) title: string;
  @ApiPropertyOptional({ description: 'plain text' })
  @Omittable()
  @IsString()
  @MaxLength(REPORT_TEXT_MAX)
  notes?: string;
  @ApiPropertyOptional({ description: 'plain text' })
  @Omittable()
  @IsString()
  @MaxLength(REPORT_TEXT_MAX)
  recommendations?: string;
}

export class UpdateReportDto {
  @ApiPropertyOptional() @Omittable() @IsString() @Length(1, 200) title?: string;
  @ApiPropertyOptional() @Omittable() @IsString() @MaxLength(REPORT_TEXT_MAX) notes?: string;
  @ApiPropertyOptional() @Omittable() @IsString() @MaxLength(REPORT_TEXT_MAX) recommendations?: string;
}

export class SendReportDto {
  @ApiPropertyOptional({ type: Number, isArray: true, description: 'farm members, by user id' })
  @Omittable()
  @IsArray()
  @ArrayMaxSize(50)
  @IsInt({ each: true })
  memberUserIds?: number[];
  @ApiPropertyOptional({ type: String, isArray: true, description: 'any other addresses' })
  @Omittable()
  @IsArray()
  @ArrayMaxSize(20)
  @IsEmail({}, { each: true, message: 'each of emails must be an e-mail address' })
  emails?: string[];
  @ApiPropertyOptional({ description: 'a short message above the report' })
  @Omittable()
  @IsString()
  @MaxLength(2000)
  message?: string;
}

export class ReportSummaryDto {
  @ApiProperty() id: number;
  @ApiProperty() farmId: number;
  @ApiProperty({ type: Number, nullable: true, description: 'null once the house was deleted' }) houseId: number | null;
  @ApiProperty() houseName: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: ['draft', 'issued'] }) status: 'draft' | 'issued';
  @ApiProperty() revision: number;
  @ApiProperty({ type: Number, nullable: true }) previousReportId: number | null;
  @ApiProperty() authorName: string;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
  @ApiProperty({ type: String, nullable: true }) issuedAt: string | null;
}

export class ReportFactDto {
  @ApiProperty() label: string;
  @ApiProperty() value: string;
}

export class ReportBarDto {
  @ApiProperty() label: string;
  @ApiProperty() value: number;
}

export class ReportBlockDto {
  @ApiProperty({ enum: ['paragraph', 'facts', 'table', 'list', 'bars'] })
  kind: 'paragraph' | 'facts' | 'table' | 'list' | 'bars';
  @ApiPropertyOptional() text?: string;
  @ApiPropertyOptional({ type: ReportFactDto, isArray: true }) facts?: ReportFactDto[];
  @ApiPropertyOptional({ type: String, isArray: true }) columns?: string[];
  @ApiPropertyOptional({ type: 'array', items: { type: 'array', items: { type: 'string' } } }) rows?: string[][];
  @ApiPropertyOptional({ type: String, isArray: true }) items?: string[];
  @ApiPropertyOptional() caption?: string;
  @ApiPropertyOptional({ type: ReportBarDto, isArray: true }) bars?: ReportBarDto[];
  @ApiPropertyOptional({ description: 'unit of the bar values' }) unit?: string;
  @ApiPropertyOptional({
    description:
      'table: a comparison, whose first cell in each row names the row and whose other columns share the width equally',
  })
  comparison?: boolean;
}

export class ReportSectionDto {
  @ApiProperty() heading: string;
  @ApiProperty({ type: ReportBlockDto, isArray: true }) blocks: ReportBlockDto[];
}

/** The report in the reader's units, as the page and the PDF show it. */
export class ReportDocumentDto {
  @ApiProperty({ enum: ['si', 'us'] }) unitSystem: 'si' | 'us';
  @ApiProperty({ enum: ['A4', 'LETTER'] }) pageSize: 'A4' | 'LETTER';
  @ApiProperty() farmName: string;
  @ApiProperty() houseName: string;
  @ApiProperty() title: string;
  @ApiProperty() subtitle: string;
  @ApiProperty({ type: ReportSectionDto, isArray: true }) sections: ReportSectionDto[];
  @ApiProperty() footer: string;
}

export class ReportDto extends ReportSummaryDto {
  @ApiProperty() notes: string;
  @ApiProperty() recommendations: string;
  @ApiProperty({ description: 'the viewer may edit, issue and revise it (report:write)' }) canWrite: boolean;
  @ApiProperty({ type: ReportDocumentDto }) document: ReportDocumentDto;
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'the saved inputs and results (SI), exactly as taken when the report was created',
  })
  snapshot: Record<string, unknown>;
}

export class ReportSentDto extends MailOutcomeDto {
  @ApiProperty({ type: String, isArray: true }) recipients: string[];
}

export class ClientFarmDto {
  @ApiProperty() farmId: number;
  @ApiProperty() farmName: string;
  @ApiProperty() houseCount: number;
  @ApiProperty({ type: ReportSummaryDto, nullable: true }) latestReport: ReportSummaryDto | null;
}
