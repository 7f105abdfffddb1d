import { ValidationError, ValidationPipe } from '@nestjs/common';
import { badInput } from './domain-error';

function firstProblem(errors: ValidationError[], prefix = ''): { field: string; message: string } | undefined {
  for (const error of errors) {
    const field = prefix ? `${prefix}.${error.property}` : error.property;
    if (error.constraints) {
      const message = Object.values(error.constraints)[0];
      return { field, message };
    }
    const nested = firstProblem(error.children ?? [], field);
    if (nested) return nested;
  }
  return undefined;
}

/**
 * The global validation pipe: strips unknown properties, converts types, and turns the first
 * failing constraint into BAD_USER_INPUT naming the field.
 */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    transform: true,
    exceptionFactory: (errors) => {
      const problem = firstProblem(errors) ?? { field: 'input', message: 'invalid input' };
      return badInput(problem.field, problem.message);
    },
  });
}
