// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { pickerInput, typeInPicker } from '@/testing/date-inputs';
import { DateInput, TimeInput } from './date-inputs';

afterEach(cleanup);

describe('the date and time inputs', () => {
  it('show and take a date day first, as in Britain, and hand the form the ISO date the API keeps', () => {
    const onChange = vi.fn();
    render(<DateInput label="Date" value="2026-03-04" onChange={onChange} />);
    expect(pickerInput('Date').value).toBe('04/03/2026');
    expect(screen.getByRole('spinbutton', { name: 'Day' }).textContent).toBe('04');
    typeInPicker('Date', '05/12/2026');
    expect(onChange).toHaveBeenLastCalledWith('2026-12-05');
  });

  it('hands on no date while what is typed is not one, so the form can say so', () => {
    const onChange = vi.fn();
    render(<DateInput label="Date" value="2026-03-04" onChange={onChange} />);
    typeInPicker('Date', '31/02/2026');
    expect(onChange).toHaveBeenLastCalledWith('');
  });

  it('keep times on the 24-hour clock', () => {
    const onChange = vi.fn();
    render(<TimeInput label="Start" value="16:30" onChange={onChange} />);
    expect(pickerInput('Start').value).toBe('16:30');
    typeInPicker('Start', '07:45');
    expect(onChange).toHaveBeenLastCalledWith('07:45');
  });
});
