import { expect } from 'vitest';

/** The text a field points to with aria-describedby (its helper or error message). */
export function describedText(field: HTMLElement): string {
  const ids = field.getAttribute('aria-describedby')?.split(/\s+/).filter(Boolean) ?? [];
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}

/** The field is marked invalid and its description carries the message. */
export function expectFieldError(field: HTMLElement, message: string): void {
  expect(field.getAttribute('aria-invalid')).toBe('true');
  expect(describedText(field)).toContain(message);
}

/** The field is not marked invalid. */
export function expectFieldValid(field: HTMLElement): void {
  expect(field.getAttribute('aria-invalid')).not.toBe('true');
}
