/**
 * Values of a raw read-model row as the MariaDB driver hands them over: a BOOLEAN column (TINYINT(1)) as 0 or 1,
 * a nullable number as null or a number.
 */
export const isTrue = (v: unknown): boolean => v === true || Number(v) === 1;

export const numberOrNull = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));
