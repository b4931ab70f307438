// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { type ConcealedRoute, newRoute, WallDiagram } from '../phone/wall-diagram';

afterEach(cleanup);

// A 3.6 m lounge wall with a single socket (86 mm plate) 450 mm up, 1.8 m along; the cable drops from the ceiling.
const SOCKET = { x: 1800, y: 450, widthMm: 86, heightMm: 86 };
const IN_LINE = [
  { x: 1800, y: 2400 },
  { x: 1800, y: 493 },
];
// Down at 700 mm along: neither within 150 mm of a corner nor in line with the socket.
const ACROSS = [
  { x: 700, y: 2400 },
  { x: 700, y: 1200 },
];

function drawn(change: Partial<ConcealedRoute> & { thicknessMm?: number | null } = {}): ConcealedRoute {
  const { thicknessMm = null, ...rest } = change;
  const r = newRoute(true);
  return { ...r, wall: { ...r.wall, thicknessMm }, accessory: SOCKET, route: IN_LINE, ...rest };
}

let kept: ConcealedRoute | null = null;
let refused = false;
function Harness({ initial }: { initial: ConcealedRoute }) {
  const [value, setValue] = useState(initial);
  kept = value;
  return (
    <WallDiagram
      value={value}
      onChange={setValue}
      onFiguresWrong={(w) => {
        refused = w;
      }}
    />
  );
}

const figure = (label: string) => screen.getByLabelText(`${label} (mm)`) as HTMLInputElement;
const type = (label: string, text: string) => fireEvent.change(figure(label), { target: { value: text } });
const chip = () => screen.getByRole('button', { name: /^Concealed route: / });
const stretches = (container: HTMLElement) => [...container.querySelectorAll('line')].map((l) => l.getAttribute('data-acceptable'));

describe('the wall drawing', () => {
  it('shows a field message for a figure it cannot take, and never drops it in silence', () => {
    render(<Harness initial={drawn()} />);
    type('Wall width', '-10');
    expect(screen.getByText('Wall width cannot be negative.')).toBeTruthy();
    expect(figure('Wall width').value).toBe('-10');
    expect(kept?.wall.widthMm).toBe(3600);
    expect(refused).toBe(true);
    type('Wall width', '0');
    expect(screen.getByText('Wall width must be at least 300 mm.')).toBeTruthy();
    // The verdict stays, judged with the last figures that could stand.
    expect(chip().textContent).toBe('Pass');
    expect(screen.getByText(/Judged with the last figures that could stand/)).toBeTruthy();
    type('Wall width', '1000');
    expect(screen.getByText('The point and route reach 1843 mm along: undo them first to make the wall narrower.')).toBeTruthy();
    type('Wall width', '4200');
    expect(kept?.wall.widthMm).toBe(4200);

    type('Cable depth', 'abc');
    expect(screen.getByText('Cable depth must be a number of millimetres, like 25.')).toBeTruthy();
    type('Cable depth', '-10');
    expect(screen.getByText('Cable depth cannot be negative.')).toBeTruthy();
    // Plausibility bound of our own (core WALL_LIMITS), not the standard's.
    type('Cable depth', '99999');
    expect(screen.getByText('Cable depth above 1000 mm is not a real depth; check the figure.')).toBeTruthy();
    expect(kept?.depthMm).toBe(25);
    type('Cable depth', '30');
    expect(kept?.depthMm).toBe(30);
    expect(refused).toBe(false);
  });

  it('keeps depth and thickness consistent, and takes a held-back figure once the other is put right', () => {
    render(<Harness initial={drawn({ thicknessMm: 75 })} />);
    type('Cable depth', '80');
    expect(screen.getByText('The cable cannot be deeper than the 75 mm wall.')).toBeTruthy();
    type('Wall thickness', '100');
    expect(screen.queryByText('The cable cannot be deeper than the 75 mm wall.')).toBeNull();
    expect(kept).toMatchObject({ depthMm: 80, wall: { thicknessMm: 100 } });
    type('Wall thickness', '');
    expect(kept?.wall.thicknessMm).toBeNull();
  });

  it('says "within" 150 mm, and shows a failed route by its own figures, not as a depth problem', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: zones within 150 mm of the top and of an angle (C1)
    const { container } = render(<Harness initial={drawn({ route: ACROSS })} />);
    expect(chip().textContent).toBe('Fail');
    expect(chip().textContent).not.toMatch(/50 mm/);
    expect(screen.getByText(/keep within 150 mm of the top of the wall, within 150 mm of a corner, or in line with the accessory/)).toBeTruthy();
    expect(stretches(container)).toEqual(['false']);
  });

  it('turns the drawing green with the verdict when the cable is deep enough for the zones not to apply', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: 60 mm below this face of a 150 mm wall is 90 mm from the other (C1)
    const { container } = render(<Harness initial={drawn({ route: ACROSS, thicknessMm: 150 })} />);
    type('Cable depth', '60');
    expect(chip().textContent).toBe('Pass');
    expect(stretches(container)).toEqual(['true']);
    // Without the thickness the far face is unknown: a check, and the stretch amber, not green or red.
    type('Wall thickness', '');
    expect(chip().textContent).toBe('Check');
    expect(stretches(container)).toEqual(['']);
    expect(screen.getByText(/enter the wall’s thickness/)).toBeTruthy();
  });

  it('fails a cable 15 mm from the back of a 75 mm partition outside the zones', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.202: less than 50 mm from either face of the wall or partition (C1)
    render(<Harness initial={drawn({ route: ACROSS, thicknessMm: 75 })} />);
    type('Cable depth', '60');
    expect(chip().textContent).toBe('Fail');
    expect(screen.getByText(/15 mm from the other face of this 75 mm wall/)).toBeTruthy();
  });

  it('names each figure in full, two to a row', () => {
    render(<Harness initial={drawn()} />);
    const group = screen.getByRole('group', { name: 'The wall and the cable' });
    expect(within(group).getAllByRole('textbox').map((i) => i.getAttribute('id') && document.querySelector(`label[for="${i.id}"]`)?.textContent)).toEqual([
      'Wall width (mm)',
      'Wall height (mm)',
      'Wall thickness (mm)',
      'Cable depth (mm)',
    ]);
  });
});
