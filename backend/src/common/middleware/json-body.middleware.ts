import { BadRequestException, HttpException, HttpStatus, PayloadTooLargeException } from '@nestjs/common';
import { json, type NextFunction, type Request, type Response } from 'express';
import { ApiException, ErrorCode } from '../errors/api-errors';
import { sendApiError } from '../filters/api-exception.filter';

/** Largest JSON body the API reads. Journal entries are small; uploads go through their own route. */
export const JSON_BODY_LIMIT = '64kb';

function bodyError(err: unknown, limit: string): unknown {
  const type = (err as { type?: string }).type;
  if (type === 'entity.parse.failed')
    return new ApiException(HttpStatus.BAD_REQUEST, 'The request body is not valid JSON.', ErrorCode.invalidJson);
  if (type === 'entity.too.large') return new PayloadTooLargeException(`The request body is larger than ${limit}.`);
  const status = (err as { status?: number }).status;
  if (status && status >= 400 && status < 500) return new HttpException('The request body could not be read.', status);
  return err instanceof Error ? err : new BadRequestException('The request body could not be read.');
}

/** express.json with its failures answered as readable API errors (never passed on with next(err)). */
export function jsonBodyMiddleware(limit = JSON_BODY_LIMIT) {
  const parse = json({ limit });
  return (req: Request, res: Response, next: NextFunction): void => {
    parse(req, res, (err?: unknown) => {
      if (!err) return next();
      sendApiError(req, res, bodyError(err, limit));
    });
  };
}
