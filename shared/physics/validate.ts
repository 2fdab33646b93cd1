// Errors quote the bad value so a caller can find it without a debugger.
export function requirePositive(name: string, value: number): number {
  if (!(Number.isFinite(value) && value > 0)) {
    throw new RangeError(`${name} must be a positive finite number, got ${String(value)}`);
  }
  return value;
}

export function requireNonNegative(name: string, value: number): number {
  if (!(Number.isFinite(value) && value >= 0)) {
    throw new RangeError(`${name} must be a non-negative finite number, got ${String(value)}`);
  }
  return value;
}

// Infinity is allowed where it means "steady state".
export function requireTime(name: string, value: number): number {
  if (Number.isNaN(value) || value < 0) {
    throw new RangeError(`${name} must be a non-negative number or Infinity, got ${String(value)}`);
  }
  return value;
}

export function requireAtLeast(name: string, value: number, minimum: number): number {
  if (!(Number.isFinite(value) && value >= minimum)) {
    throw new RangeError(`${name} must be a finite number of at least ${minimum}, got ${String(value)}`);
  }
  return value;
}

export function requireFinite(name: string, value: number): number {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
  }
  return value;
}
