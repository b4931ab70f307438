// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { CIRCUIT_KIND_WORDS, PROTECTIVE_DEVICE_WORDS } from '@wiretrail/core';
import { useForm } from 'react-hook-form';
import { afterEach, describe, expect, it } from 'vitest';
import { type CircuitDetails, CircuitDetailFields, circuitDetailsOf } from '../phone/circuit-fields';

function Details() {
  const { register, control, formState } = useForm<CircuitDetails>({ defaultValues: circuitDetailsOf(null) });
  return <CircuitDetailFields register={register} control={control} errors={formState.errors} />;
}

afterEach(cleanup);

describe("the phone's circuit details", () => {
  it("offers the kinds and protective devices in core's words, as the office names them", () => {
    render(<Details />);
    const options = (label: string) => within(screen.getByLabelText(label)).getAllByRole('option').map((o) => o.textContent);
    expect(options('Kind')).toEqual(Object.values(CIRCUIT_KIND_WORDS));
    expect(options('Protective device')).toEqual(['Not known', ...Object.values(PROTECTIVE_DEVICE_WORDS)]);
    expect(options('Protective device')).toContain('BS 3036 semi-enclosed fuse');
  });

  it('offers the ratings of the device chosen, the RCD types and the cable sizes, and keeps what is typed off the list', async () => {
    render(<Details />);
    const offered = async (label: string) => {
      const input = screen.getByRole('combobox', { name: label });
      fireEvent.mouseDown(input);
      const list = within(await screen.findByRole('listbox')).getAllByRole('option').map((o) => o.textContent);
      fireEvent.keyDown(input, { key: 'Escape' });
      return list;
    };
    fireEvent.change(screen.getByLabelText('Protective device'), { target: { value: 'BS 3036' } });
    // BS 7671:2018+A2:2022 Tables 41.2 and 41.4, BS 3036 semi-enclosed fuses (M, as the rule set holds them)
    expect(await offered('Rating (A)')).toEqual(['5', '15', '20', '30', '45', '60', '100']);
    expect(await offered('RCD type')).toEqual(['A', 'AC', 'F', 'B', 'A S', 'AC S', 'F S', 'B S']);
    // IEC 60228 nominal sizes (M)
    expect((await offered('Live size (mm²)')).slice(0, 7)).toEqual(['1', '1.5', '2.5', '4', '6', '10', '16']);
    fireEvent.change(screen.getByRole('combobox', { name: 'Cpc size (mm²)' }), { target: { value: '1.0' } });
    expect((screen.getByRole('combobox', { name: 'Cpc size (mm²)' }) as HTMLInputElement).value).toBe('1.0');
  });
});
