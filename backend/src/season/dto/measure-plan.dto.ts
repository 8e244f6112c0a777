import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsObject, ValidateNested } from 'class-validator';
import { MeasureDto } from './season-request.dto';

/** Measures kept with a house; at most as many as one comparison takes. */
export const MAX_PLANNED_MEASURES = 30;

export class PutMeasurePlanDto {
  @ApiProperty({
    type: MeasureDto,
    isArray: true,
    maxItems: MAX_PLANNED_MEASURES,
    description: 'the measures to keep with the house, each with its settings and cost (null cost = not known yet)',
  })
  @IsArray()
  @ArrayMaxSize(MAX_PLANNED_MEASURES)
  @IsObject({ each: true })
  @ValidateNested({ each: true })
  @Type(() => MeasureDto)
  measures: MeasureDto[];
}

export class MeasurePlanDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ type: MeasureDto, isArray: true, description: 'empty until the first save' }) measures: MeasureDto[];
  @ApiProperty({ description: 'raised on every save; 0 before the first' }) version: number;
}
