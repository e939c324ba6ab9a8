import {
  applyDecorators,
  BadRequestException,
  CallHandler,
  ExecutionContext,
  HttpStatus,
  Injectable,
  mixin,
  NestInterceptor,
  PayloadTooLargeException,
  Type,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { catchError, Observable, throwError } from 'rxjs';
import { ApiException } from '../common/api-error';

/** The multipart field every upload uses. */
export const UPLOAD_FIELD = 'file';

/** An uploaded file as multer's memory storage hands it over. */
export interface UploadedBuffer {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

const megabytes = (bytes: number): string => `${+(bytes / (1024 * 1024)).toFixed(2)} MB`;

/** Turns multer's errors into the one error shape with sentences a teacher can act on. */
function uploadErrors(maxBytes: number, what: string): Type<NestInterceptor> {
  @Injectable()
  class UploadErrorsInterceptor implements NestInterceptor {
    intercept(_ctx: ExecutionContext, next: CallHandler): Observable<unknown> {
      return next.handle().pipe(
        catchError((err: unknown) => {
          if (err instanceof PayloadTooLargeException) {
            return throwError(
              () => new ApiException(HttpStatus.PAYLOAD_TOO_LARGE, 'file_too_large', `The ${what} is larger than ${megabytes(maxBytes)}.`),
            );
          }
          if (err instanceof BadRequestException && !(err instanceof ApiException)) {
            return throwError(
              () => new ApiException(HttpStatus.BAD_REQUEST, 'bad_upload', `Send one ${what} in the form field "${UPLOAD_FIELD}".`),
            );
          }
          return throwError(() => err);
        }),
      );
    }
  }
  return mixin(UploadErrorsInterceptor);
}

/** One file in field `file`, kept in memory, refused with 413 past `maxBytes`. */
export function SingleFileUpload(maxBytes: number, what: string) {
  return applyDecorators(
    UseInterceptors(
      uploadErrors(maxBytes, what),
      FileInterceptor(UPLOAD_FIELD, { limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 10_000 } }),
    ),
  );
}

/** The file, or a 400 when the form had none. */
export function requireFile(file: UploadedBuffer | undefined, what: string): UploadedBuffer {
  if (!file) throw new ApiException(HttpStatus.BAD_REQUEST, 'file_missing', `Choose a ${what} to upload (form field "${UPLOAD_FIELD}").`);
  return file;
}
