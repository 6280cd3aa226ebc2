// Input guards shared by the trade computations. They throw RangeError naming the argument, so a caller
// (a route handler, a form action) can turn a bad number into a field error instead of a NaN on a traveler.

export function requireFinite(name: string, value: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number, got ${value}`);
  return value;
}

export function requirePositive(name: string, value: number): number {
  if (!(Number.isFinite(value) && value > 0)) throw new RangeError(`${name} must be a positive number, got ${value}`);
  return value;
}

export function requireNonNegative(name: string, value: number): number {
  if (!(Number.isFinite(value) && value >= 0)) {
    throw new RangeError(`${name} must be zero or a positive number, got ${value}`);
  }
  return value;
}

/** A fraction in the closed interval [min, max]. */
export function requireInRange(name: string, value: number, min: number, max: number): number {
  if (!(Number.isFinite(value) && value >= min && value <= max)) {
    throw new RangeError(`${name} must be between ${min} and ${max}, got ${value}`);
  }
  return value;
}

export function requireInteger(name: string, value: number, min: number, max: number): number {
  if (!(Number.isInteger(value) && value >= min && value <= max)) {
    throw new RangeError(`${name} must be a whole number from ${min} to ${max}, got ${value}`);
  }
  return value;
}
