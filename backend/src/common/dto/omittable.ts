import { ValidateIf } from 'class-validator';

/**
 * The field may be left out, but a null is checked like any other value (so it is refused by the type
 * check). Use instead of @IsOptional() on fields whose column is NOT NULL: @IsOptional() lets null
 * through to the database, which then fails with a 500.
 */
export const IsOmittable = (): PropertyDecorator =>
  ValidateIf((_object: object, value: unknown) => value !== undefined);
