import { type BrowserContext, expect, type Locator, type Page } from '@playwright/test';

/** What a title becomes inside a RegExp: the brackets of a test's stamp matched as any character. */
const titlePattern = (title: string) => new RegExp(title.replace(/[()]/g, '.'));

/** Waits until the service worker controls the page, so that a reload offline is served by it alone. */
export async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (!navigator.serviceWorker.controller) {
      await new Promise<void>((resolve) => navigator.serviceWorker.addEventListener('controllerchange', () => resolve(), { once: true }));
    }
  });
}

/** The technician's phone: Today, one visit's sections, and the Sync screen. */
export class TechnicianVisitPage {
  readonly trail: Locator;
  readonly cableForm: Locator;
  readonly pointForm: Locator;
  readonly photoForm: Locator;

  constructor(readonly page: Page) {
    this.trail = page.getByRole('list', { name: 'Trail of this visit' });
    this.cableForm = page.getByRole('form', { name: 'Record a cable' });
    this.pointForm = page.getByRole('form', { name: 'Record a point change' });
    this.photoForm = page.getByRole('form', { name: 'Photo details' });
  }

  /** Opens Today, waits for the service worker to take the page, and for the first sync to finish. */
  async openToday(): Promise<void> {
    await this.page.goto('/today');
    await this.expectToday();
    await this.waitForServiceWorker();
    await expect(this.page.getByText('Up to date')).toBeVisible({ timeout: 20_000 });
  }

  async expectToday(): Promise<void> {
    await expect(this.page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
  }

  async waitForServiceWorker(): Promise<void> {
    await waitForServiceWorker(this.page);
  }

  /** A visit's card on Today. */
  visitCard(title: string): Locator {
    return this.page.getByRole('article', { name: title });
  }

  /** Opens a visit from the list on Today and returns its id. */
  async openFromToday(title: string | RegExp): Promise<string> {
    const name = typeof title === 'string' ? titlePattern(title) : title;
    await this.page.getByRole('region', { name: 'My visits' }).getByRole('link', { name }).click();
    await this.expectVisit(title);
    return this.visitId();
  }

  async expectVisit(title: string | RegExp): Promise<void> {
    await expect(this.page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  }

  /** The visit's id, read from the address of its screen. */
  visitId(): string {
    return this.page.url().split('/').pop()!;
  }

  /** Cuts the phone's signal, or gives it back, and waits for the app to say it has none. */
  async goOffline(context: BrowserContext): Promise<void> {
    await context.setOffline(true);
    await expect(this.page.getByText('No signal — saving on this phone')).toBeVisible();
  }

  async section(name: 'Trail' | 'Cables' | 'Points' | 'Circuits & tests' | 'Sign-off'): Promise<void> {
    await this.page.getByRole('tab', { name }).click();
  }

  async readCautions(): Promise<void> {
    await this.page.getByRole('button', { name: 'I have read these cautions' }).click();
  }

  async addNote(text: string): Promise<void> {
    await this.page.getByLabel('Note', { exact: true }).fill(text);
    await this.page.getByRole('button', { name: 'Add note' }).click();
    await expect(this.trail.getByText(text)).toBeVisible();
  }

  /** A trail entry, by the words it shows. */
  trailEntry(text: string): Locator {
    return this.trail.getByRole('listitem').filter({ hasText: text });
  }

  /** Sets the colour seen at one pin of a cable's end in the wiremap. */
  async pickColour(end: string, pin: number, colour: string): Promise<void> {
    const escaped = end.replace(/[()]/g, '\\$&');
    await this.page.getByRole('button', { name: new RegExp(`^${escaped} pin ${pin}:`) }).click();
    await this.page.getByRole('dialog', { name: new RegExp(`pin ${pin}: colour seen`) }).getByRole('button', { name: colour, exact: true }).click();
  }

  /** The readings form of one circuit, opened from the list on Circuits & tests. */
  async openReadings(circuit: RegExp, number: number): Promise<Locator> {
    await this.page.getByRole('list', { name: 'Circuits on this site' }).getByRole('link', { name: circuit }).click();
    return this.page.getByRole('form', { name: `Readings for circuit ${number}` });
  }

  /**
   * Starts a new point on the Points form that extends ring circuit 1 (the demo's B32 ground-floor sockets) by 8 m of
   * 2.5/1.5 cable, with the end-to-end readings before the work: enough for every check before the work to answer.
   */
  async startRingExtension(where = 'Beside the new desk'): Promise<Locator> {
    await this.page.getByRole('link', { name: 'Record a point change' }).click();
    const form = this.pointForm;
    await form.getByRole('button', { name: 'New point', exact: true }).click();
    await form.getByLabel('Accessory').fill('Twin socket-outlet');
    await form.getByLabel('Where it is: where on the wall').fill(where);
    await form.getByLabel('Circuit', { exact: true }).selectOption({ label: '1 · Sockets, ground floor' });
    await form.getByLabel('How it joins the circuit').selectOption({ label: 'Ring extended through it' });
    await form.getByLabel('Cable added to the ring (m)').fill('8');
    await form.getByLabel('r1 before (Ω)').fill('0.3705');
    await form.getByLabel('rn before (Ω)').fill('0.3705');
    await form.getByLabel('r2 before (Ω)').fill('0.605');
    return form;
  }

  /** Signs in the signature box with a stroke, as a thumb would. */
  async sign(): Promise<void> {
    const canvas = this.page.getByLabel('Signature box: sign with your finger');
    // Mid-screen, clear of the bottom navigation.
    await canvas.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    const box = (await canvas.boundingBox())!;
    await this.page.mouse.move(box.x + 30, box.y + 120);
    await this.page.mouse.down();
    for (let i = 1; i <= 20; i++) await this.page.mouse.move(box.x + 30 + i * 12, box.y + 120 - Math.sin(i / 2) * 40, { steps: 2 });
    await this.page.mouse.up();
  }

  /** Opens the Sync screen from the bottom navigation. */
  async openSync(): Promise<void> {
    await this.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sync' }).click();
  }
}
