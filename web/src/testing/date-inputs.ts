import { fireEvent, screen } from '@testing-library/react';

/** The date or time picker's own input, which holds what it shows (14/03/2026, 09:30) and takes a whole value typed in. */
export function pickerInput(label: string): HTMLInputElement {
  const input = screen.getAllByLabelText(label).find((el): el is HTMLInputElement => el instanceof HTMLInputElement);
  if (!input) throw new Error(`No date or time picker labelled ${label}`);
  return input;
}

/** Types a whole date (dd/mm/yyyy) or time (hh:mm) into a picker, as the browser's autofill would. */
export const typeInPicker = (label: string, value: string) => fireEvent.change(pickerInput(label), { target: { value } });
