import { expect, type Locator, type Page } from '@playwright/test';
import { say, type Lang, type Say } from '../support/catalogue-leaks';

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

const STEPS = ['who', 'fuel', 'reefer', 'safety', 'rest', 'confirm'] as const;
type StepKey = (typeof STEPS)[number];

/**
 * The gate handoff form (/gate/trailers/[id]) as a driver fills it, step by step, in the language
 * the page is read in: steps, safety statements and "Same as last" are found by their test ids,
 * every other question by its words in that language's catalogue (the Handoff namespace).
 */
export class HandoffFormPage {
  private readonly t: Say;

  constructor(
    private readonly page: Page,
    readonly lang: Lang = 'en',
  ) {
    this.t = say(lang, 'Handoff');
  }

  /** A step's key from its key or its title in this language ("Safety checks" → safety). */
  private step(step: string): StepKey {
    const key = (STEPS as readonly string[]).includes(step)
      ? (step as StepKey)
      : STEPS.find((k) => this.t(`steps.${k}`) === step);
    if (!key) throw new Error(`no step ${step}`);
    return key;
  }

  /** The open step's heading ("3. Safety checks"). */
  stepHeading(step: string): Locator {
    return this.page.locator(`section[data-step="${this.step(step)}"]`).getByRole('heading', { level: 2 });
  }

  /** Opens a step unless it is open (a folded step is one button: "3. Safety checks: …"). */
  async openStep(step: string) {
    const heading = this.stepHeading(step);
    const folded = this.page.locator(`button[data-step="${this.step(step)}"]`);
    // the draft is read from the phone first: wait for the step to show, open or folded
    await expect(heading.or(folded)).toBeVisible();
    if (await heading.isVisible()) return;
    await folded.click();
    await expect(this.stepHeading(step)).toBeVisible();
  }

  /** Unfolds the items of a zone of the rest of the box, or of a safety group (named in this language). */
  async showItems(name: string) {
    const toggle = this.page.getByRole('button', {
      name: new RegExp(
        `^(${escape(this.t('zone.showItems', { zone: name.toLocaleLowerCase(this.lang) }))}|${escape(this.t('safety.showItems', { group: name }))})$`,
      ),
    });
    if (await toggle.isVisible()) await toggle.click();
  }

  item(label: string): Locator {
    return this.page.locator(`li[aria-label="${label}"]`);
  }

  async choose(group: string, option: string, within: Locator | Page = this.page) {
    await within
      .getByRole('group', { name: group })
      .getByRole('button', { name: option, exact: true })
      .click();
  }

  async fillHeader({ tractor, loaded }: { tractor: string; loaded: boolean }) {
    await this.openStep('who');
    await this.page.getByLabel(this.t('who.tractor')).fill(tractor);
    await this.choose(this.t('who.loadedQuestion'), this.t(loaded ? 'who.loaded' : 'who.empty'));
  }

  /** The reefer's fuel and readings; `fuel` is the button's words in this language ("Full 8/8", "6/8"). */
  async fillReefer({
    fuel,
    setpoint,
    returnAir,
    engineHours,
  }: {
    fuel: string;
    setpoint: string;
    returnAir: string;
    engineHours: string;
  }) {
    await this.openStep('fuel');
    await this.choose(this.t('fuel.label'), fuel);
    await this.openStep('reefer');
    await this.choose(this.t('reefer.running'), this.t('reefer.on'));
    await this.page.getByLabel(this.t('reefer.setpoint')).fill(setpoint);
    await this.page.getByLabel(this.t('reefer.returnAir')).fill(returnAir);
    await this.page.getByLabel(this.t('reefer.engineHours')).fill(engineHours);
    // an hour ago, in the browser's own time zone (datetime-local has none)
    const when = await this.page.evaluate(() => {
      const d = new Date(Date.now() - 3_600_000);
      const p = (n: number) => String(n).padStart(2, '0');
      return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}T${p(d.getHours())}:${p(d.getMinutes())}`;
    });
    await this.page.getByLabel(this.t('reefer.preTripAt')).fill(when);
    await this.choose(this.t('reefer.preTrip'), this.t('reefer.passed'));
  }

  /** One tap: every item with an earlier record takes its last condition, safety items excepted. */
  async sameAsLastEverywhere() {
    await this.openStep('rest');
    await this.page.getByTestId('same-as-last-all').click();
  }

  /** The explicit statement of each safety group ("… I looked at each"), tires with the tread given. */
  async answerSafety(treadThirtySeconds: number) {
    await this.openStep('safety');
    await this.page.getByLabel(this.t('safety.treadLabel')).fill(String(treadThirtySeconds));
    const statements = this.page.getByTestId('safety-statement');
    const n = await statements.count();
    expect(n).toBeGreaterThanOrEqual(5);
    for (let i = 0; i < n; i++) await statements.nth(i).click();
    return n;
  }

  async submit(kind: 'drop' | 'hook') {
    await this.openStep('confirm');
    await this.page.getByRole('button', { name: this.t('confirm.record', { kind }) }).click();
  }
}
