import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import type { Response } from 'express';
import { UniqueConstraintError } from 'sequelize';
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
  500: 'Internal Server Error',
};

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (body.statusCode >= 500) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    }
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
    if (exception instanceof ThrottlerException) {
      return { statusCode: 429, error: REASONS[429], message: 'Too many attempts; wait a minute and try again' };
    }
    if (exception instanceof UniqueConstraintError) {
      return { statusCode: 409, error: REASONS[409], message: 'That already exists' };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const raw = exception.getResponse();
      let message = exception.message;
      let field: string | undefined;
      if (typeof raw === 'object' && raw !== null) {
        const r = raw as { message?: unknown; field?: unknown };
        if (Array.isArray(r.message)) message = r.message.join('; ');
        else if (typeof r.message === 'string') message = r.message;
        if (typeof r.field === 'string') field = r.field;
      }
      return { statusCode, error: REASONS[statusCode] ?? 'Error', message, ...(field ? { field } : {}) };
    }
    return { statusCode: 500, error: REASONS[500], message: 'Something went wrong on the server' };
  }
}
