import { HttpStatus, ValidationError, ValidationPipe } from '@nestjs/common';
import { ApiException } from './api-error';

function flatten(errors: ValidationError[], prefix = ''): { field: string; message: string }[] {
  return errors.flatMap((e) => {
    const field = prefix ? `${prefix}.${e.property}` : e.property;
    const own = Object.values(e.constraints ?? {}).map((message) => ({ field, message }));
    return [...own, ...flatten(e.children ?? [], field)];
  });
}

/** The one validation pipe, for REST and gateways alike. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    stopAtFirstError: true,
    exceptionFactory: (errors) => {
      const details = flatten(errors);
      return new ApiException(
        HttpStatus.BAD_REQUEST,
        'validation_failed',
        details.length === 1 ? details[0].message : `${details.length} fields need attention.`,
        details,
      );
    },
  });
}
