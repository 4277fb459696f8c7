/** Shared argument checks: bad input gets a clear RangeError naming the argument. */

export function assertCount(name: string, value: number): void {
  if (!Number.isInteger(value) || value < 0) {
    throw new RangeError(`${name} must be a non-negative integer, got ${value}`);
  }
}

export function assertSuccessesTrials(successes: number, trials: number, label = ''): void {
  const prefix = label ? `${label}: ` : '';
  assertCount(`${prefix}trials`, trials);
  assertCount(`${prefix}successes`, successes);
  if (successes > trials) {
    throw new RangeError(`${prefix}successes (${successes}) cannot exceed trials (${trials})`);
  }
}

export function assertConfidence(confidence: number): void {
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`confidence must be strictly between 0 and 1, got ${confidence}`);
  }
}

export function assertFinite(name: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${value}`);
  }
}

export function assertNonNegative(name: string, value: number): void {
  assertFinite(name, value);
  if (value < 0) throw new RangeError(`${name} must not be negative, got ${value}`);
}
