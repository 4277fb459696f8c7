import {
  type CallHandler,
  type ExecutionContext,
  HttpStatus,
  Injectable,
  type NestInterceptor,
  mixin,
  type Type,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import multer from 'multer';
import type { Observable } from 'rxjs';
import { ApiException } from '../common/errors/api-errors';
import { JournalErrorCode } from '../journal/journal-errors';

/**
 * Read one multipart file field `file` into memory (never to disk under its own name), refusing bigger
 * files with 413 "file_too_large" and any other multipart problem with a clear 400.
 */
export function UploadInterceptor(maxBytes: number, what: string): Type<NestInterceptor> {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 10_000, parts: 25 },
  }).single('file');

  @Injectable()
  class Interceptor implements NestInterceptor {
    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      const http = context.switchToHttp();
      const req = http.getRequest<Request>();
      await new Promise<void>((resolve, reject) =>
        upload(req, http.getResponse<Response>(), (err: unknown) => {
          if (!err) return resolve();
          if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
            return reject(
              new ApiException(
                HttpStatus.PAYLOAD_TOO_LARGE,
                `The ${what} is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`,
                JournalErrorCode.fileTooLarge,
              ),
            );
          }
          const message =
            err instanceof multer.MulterError
              ? `The upload was refused: ${err.message} (send one file in the field "file").`
              : 'The upload could not be read; send multipart/form-data with one file in the field "file".';
          return reject(new ApiException(HttpStatus.BAD_REQUEST, message, 'upload_invalid'));
        }),
      );
      if (!req.file)
        throw new ApiException(
          HttpStatus.BAD_REQUEST,
          `Send the ${what} as multipart/form-data in the field "file".`,
          'upload_invalid',
          { file: ['A file is required.'] },
        );
      return next.handle();
    }
  }
  return mixin(Interceptor);
}
