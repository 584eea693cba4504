import { CallHandler, ExecutionContext, Injectable, NestInterceptor, PayloadTooLargeException } from '@nestjs/common';
import { catchError, throwError, type Observable } from 'rxjs';
import { PHOTO_MAX_BYTES } from './photo-image';

/** Bound before multer's interceptor: turns its terse "File too large" into a message a person can act on. */
@Injectable()
export class PhotoTooLargeMessage implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next
      .handle()
      .pipe(
        catchError((error: unknown) =>
          throwError(() =>
            error instanceof PayloadTooLargeException
              ? new PayloadTooLargeException(
                  `The photo is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB. Send a smaller photo.`,
                )
              : error,
          ),
        ),
      );
  }
}
