import type { Locator, Page } from '@playwright/test';

/**
 * The date and time pickers are a row of day, month and year (or hour and minute) fields: a person tabs or clicks
 * into the first and types the figures, and the picker moves on by itself. Types "16/12/2026" or "09:30" so.
 */
export async function typeInPicker(scope: Page | Locator, label: string, value: string): Promise<void> {
  const group = scope.getByRole('group', { name: label, exact: true });
  await group.getByRole('spinbutton').first().focus();
  await group.page().keyboard.type(value.replace(/\D/g, ''));
}

/** The picker's value as it reads: 16/12/2026, 09:30. */
export const pickerInput = (scope: Page | Locator, label: string): Locator => scope.getByLabel(label, { exact: true }).and(scope.locator('input'));
