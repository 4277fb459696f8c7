import { BadRequestException, HttpException, HttpStatus, PayloadTooLargeException } from '@nestjs/common';
import { json, type NextFunction, type Request, type Response } from 'express';
import { ApiException, ErrorCode } from '../errors/api-errors';
import { sendApiError } from '../filters/api-exception.filter';
import { exceedsDepth, flushFloatEdges, JSON_DEPTH_LIMIT } from './json-shape';

/** Largest JSON body the API reads. Journal entries are small; uploads go through their own route. */
export const JSON_BODY_LIMIT = '64kb';

/** Thrown from express.json's verify step; body-parser passes it on as the request's error. */
class TooDeepError extends Error {
  readonly status = HttpStatus.BAD_REQUEST;
  readonly tooDeep = true;
}

function bodyError(err: unknown, limit: string): unknown {
  if ((err as { tooDeep?: boolean }).tooDeep)
    return new ApiException(
      HttpStatus.BAD_REQUEST,
      `The request body is nested too deeply (more than ${JSON_DEPTH_LIMIT} levels).`,
      ErrorCode.invalidJson,
    );
  const type = (err as { type?: string }).type;
  if (type === 'entity.parse.failed')
    return new ApiException(HttpStatus.BAD_REQUEST, 'The request body is not valid JSON.', ErrorCode.invalidJson);
  if (type === 'entity.too.large') return new PayloadTooLargeException(`The request body is larger than ${limit}.`);
  const status = (err as { status?: number }).status;
  if (status && status >= 400 && status < 500) return new HttpException('The request body could not be read.', status);
  return err instanceof Error ? err : new BadRequestException('The request body could not be read.');
}

/**
 * express.json with the size limit, the nesting limit and the float-edge reviver (json-shape.ts), its
 * failures answered as readable API errors (never passed on with next(err)).
 */
export function jsonBodyMiddleware(limit = JSON_BODY_LIMIT) {
  const parse = json({
    limit,
    reviver: flushFloatEdges,
    verify: (_req, _res, raw) => {
      if (exceedsDepth(raw)) throw new TooDeepError('too deep');
    },
  });
  return (req: Request, res: Response, next: NextFunction): void => {
    parse(req, res, (err?: unknown) => {
      if (!err) return next();
      sendApiError(req, res, bodyError(err, limit));
    });
  };
}
