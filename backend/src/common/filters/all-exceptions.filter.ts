import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { BaseError as SequelizeError, UniqueConstraintError } from 'sequelize';
import { DatabaseBusyError } from '../../database/sqlite-writer';
import { StaleWriteException } from '../versioning';
import { TemperatureLogError } from '../../temperature-logs/csv/temperature-log-csv';
import { EngineInputError } from '@thermbay/engine/errors';

export interface FieldProblem {
  field: string;
  message: string;
}

/** The one JSON shape of every error the API returns. Never a stack trace. */
export interface ErrorBody {
  statusCode: number;
  error: string;
  message: string;
  field?: string;
  details?: FieldProblem[];
  /** 409 on a stale write: what is stored now, in the shape the resource's GET answers */
  current?: unknown;
}

/** Thrown by the validation pipe with one entry per offending field. */
export class RequestValidationException extends HttpException {
  constructor(public readonly details: FieldProblem[]) {
    super(details.map((d) => d.message).join('; ') || 'The request is not valid', HttpStatus.BAD_REQUEST);
  }
}

const REASONS: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  428: 'Precondition Required',
  500: 'Internal Server Error',
  502: 'Bad Gateway',
  503: 'Service Unavailable',
  504: 'Gateway Timeout',
};

/**
 * Database errors that mean "busy, try again" rather than "broken": SQLite's lock errors and
 * PostgreSQL's serialisation failure, deadlock and lock time-out. They answer 503, never 500.
 */
const BUSY_CODES = new Set(['SQLITE_BUSY', 'SQLITE_LOCKED', '40001', '40P01', '55P03']);

/** The driver's error code (SQLITE_BUSY, SQLITE_CONSTRAINT, a PostgreSQL SQLSTATE …), if any. */
export function databaseErrorCode(exception: unknown): string | undefined {
  if (exception instanceof DatabaseBusyError) return exception.code;
  if (!(exception instanceof SequelizeError)) return undefined;
  const parent = (exception as { parent?: { code?: unknown } }).parent;
  return typeof parent?.code === 'string' ? parent.code : undefined;
}

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (body.statusCode >= 500) {
      const code = databaseErrorCode(exception);
      const text = exception instanceof Error ? (exception.stack ?? exception.message) : String(exception);
      this.logger.error(code ? `[${code}] ${text}` : text);
    }
    if (body.statusCode === 503) response.setHeader('Retry-After', '1');
    response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ErrorBody {
    if (exception instanceof TemperatureLogError) {
      // A file's problems, line by line: `field` is 'line 12' (or 'file' for the file as a whole).
      const details = exception.errors.map((problem) => ({
        field: problem.line === null ? 'file' : `line ${problem.line}`,
        message: problem.message,
      }));
      if (exception.moreErrorCount > 0)
        details.push({ field: 'file', message: `${exception.moreErrorCount} more bad lines not listed` });
      return { statusCode: 422, error: REASONS[422], message: exception.message, field: exception.field, details };
    }
    if (exception instanceof EngineInputError) {
      return { statusCode: 422, error: REASONS[422], message: exception.message, field: exception.field };
    }
    if (exception instanceof RequestValidationException) {
      return {
        statusCode: 400,
        error: REASONS[400],
        message: exception.message,
        field: exception.details[0]?.field,
        details: exception.details,
      };
    }
    if (exception instanceof DatabaseBusyError || BUSY_CODES.has(databaseErrorCode(exception) ?? '')) {
      return { statusCode: 503, error: REASONS[503], message: 'The database is busy; try again in a moment' };
    }
    if (exception instanceof StaleWriteException) {
      return { statusCode: 409, error: REASONS[409], message: exception.message, current: exception.current };
    }
    if (exception instanceof UniqueConstraintError) {
      return { statusCode: 409, error: REASONS[409], message: 'That already exists' };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const raw = exception.getResponse();
      let message = exception.message;
      let field: string | undefined;
      let details: FieldProblem[] | undefined;
      if (typeof raw === 'object' && raw !== null) {
        const r = raw as { message?: unknown; field?: unknown; details?: unknown };
        if (Array.isArray(r.message)) message = r.message.join('; ');
        else if (typeof r.message === 'string') message = r.message;
        if (typeof r.field === 'string') field = r.field;
        if (Array.isArray(r.details)) details = r.details as FieldProblem[];
      }
      return {
        statusCode,
        error: REASONS[statusCode] ?? 'Error',
        message,
        ...(field ? { field } : {}),
        ...(details ? { details } : {}),
      };
    }
    return { statusCode: 500, error: REASONS[500], message: 'Something went wrong on the server' };
  }
}
