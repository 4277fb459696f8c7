import { type PipeTransform } from '@nestjs/common';
import { recordNotFound } from './journal-errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A record id in the path: anything but a UUID is simply "not found" (as another crew's id is). */
export class RecordIdPipe implements PipeTransform<string, string> {
  constructor(private readonly what: string) {}
  transform(value: string): string {
    if (typeof value !== 'string' || !UUID.test(value)) throw recordNotFound(this.what);
    return value.toLowerCase();
  }
}
