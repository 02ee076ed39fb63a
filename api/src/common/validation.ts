import { BadRequestException, ValidationError, ValidationPipe } from '@nestjs/common';

function flatten(
  errors: ValidationError[],
  prefix = '',
): { property: string; constraints: Record<string, string> }[] {
  return errors.flatMap((e) => {
    const property = prefix ? `${prefix}.${e.property}` : e.property;
    const own = e.constraints ? [{ property, constraints: e.constraints }] : [];
    return [...own, ...flatten(e.children ?? [], property)];
  });
}

/** The global pipe: strips nothing silently (unknown fields are refused), converts types. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => {
      const details = flatten(errors);
      const message = details.map((d) => Object.values(d.constraints).join('; ')).join('; ');
      return new BadRequestException({ message: message || 'Invalid request.', details });
    },
  });
}
