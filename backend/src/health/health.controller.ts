import { Controller, Get, HttpStatus, Logger, Res } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { ApiOkResponse, ApiProperty, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Sequelize } from 'sequelize-typescript';
import { Public } from '../common/decorators/public.decorator';

class DatabaseHealthDto {
  @ApiProperty({ enum: ['sqlite', 'postgres'], description: 'which database this instance runs on' })
  dialect: 'sqlite' | 'postgres';
  @ApiProperty({ description: 'whether a trivial query answered just now' }) reachable: boolean;
}

class HealthDto {
  @ApiProperty({ enum: ['ok', 'unavailable'], example: 'ok' }) status: 'ok' | 'unavailable';
  @ApiProperty() version: string;
  @ApiProperty({ type: DatabaseHealthDto }) database: DatabaseHealthDto;
}

/** How long the database may take to answer before the instance reports itself unavailable. */
const DATABASE_CHECK_MS = 3000;

@ApiTags('health')
@Controller('health')
export class HealthController {
  private readonly logger = new Logger('Health');

  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /**
   * For load balancers and monitors: 200 while the database answers, 503 when it does not. Names
   * the dialect only — never the host, user or the driver's message (logged on the server).
   */
  @Public()
  @Get()
  @ApiOkResponse({ type: HealthDto })
  @ApiServiceUnavailableResponse({ type: HealthDto, description: 'The database is not reachable' })
  async health(@Res({ passthrough: true }) response: Response): Promise<HealthDto> {
    const dialect = this.sequelize.getDialect() === 'postgres' ? 'postgres' : 'sqlite';
    const reachable = await this.databaseAnswers();
    if (!reachable) response.status(HttpStatus.SERVICE_UNAVAILABLE);
    return { status: reachable ? 'ok' : 'unavailable', version: '0.1.0', database: { dialect, reachable } };
  }

  private async databaseAnswers(): Promise<boolean> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer within ${DATABASE_CHECK_MS} ms`)), DATABASE_CHECK_MS);
    });
    try {
      await Promise.race([this.sequelize.query('SELECT 1'), timeout]);
      return true;
    } catch (error) {
      const code = (error as { parent?: { code?: string }; original?: { code?: string } }).parent?.code;
      this.logger.warn(`database not reachable${code ? ` (${code})` : ''}: ${(error as Error).message}`);
      return false;
    } finally {
      clearTimeout(timer);
    }
  }
}
