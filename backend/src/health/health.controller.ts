import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiProperty, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator';

class HealthDto {
  @ApiProperty({ example: 'ok' }) status: 'ok';
  @ApiProperty() version: string;
}

@ApiTags('health')
@Controller('health')
export class HealthController {
  @Public()
  @Get()
  @ApiOkResponse({ type: HealthDto })
  health(): HealthDto {
    return { status: 'ok', version: '0.1.0' };
  }
}
