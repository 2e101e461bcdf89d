import { describe, expect, it } from 'vitest';
import { defaultDocSetSettings } from '@linkloom/shared';
import { fromForm, toForm } from './settings-form-model.js';

describe('settings form model', () => {
  it('round-trips the defaults unchanged', () => {
    const defaults = defaultDocSetSettings();
    expect(fromForm(toForm(defaults))).toEqual({ settings: defaults, errors: {} });
  });

  // Brin & Page, "The Anatomy of a Large-Scale Hypertextual Web Search Engine" (1998), section 2.1.1 (quoted from
  // memory): the damping factor d is a probability, "usually set to 0.85"; 0 and 1 make no sense for a reader model.
  it('accepts 0.85 and rejects a damping factor of 1 or an empty field', () => {
    const form = toForm(defaultDocSetSettings());
    expect(fromForm({ ...form, damping: '0.85' }).settings?.damping).toBe(0.85);
    expect(fromForm({ ...form, damping: '1' }).errors.damping).toMatch(/below 1/);
    expect(fromForm({ ...form, damping: '' }).errors.damping).toBeTruthy();
  });

  it('reads one entry per line, redirects as "from -> to", and names the failing field', () => {
    const form = {
      ...toForm(defaultDocSetSettings()),
      entryPages: 'index.md\n\n guide/start.md ',
      redirects: 'old.md -> new.md\nbroken-line',
    };
    const out = fromForm(form);
    expect(out.settings).toBeNull();
    expect(out.errors.redirects).toMatch(/Line 2/);
    const fixed = fromForm({ ...form, redirects: 'old.md -> new.md', siteBaseUrls: 'ftp://docs.example.org' });
    expect(fixed.errors.siteBaseUrls).toMatch(/Entry 1/);
    const ok = fromForm({ ...form, redirects: 'old.md -> new.md' });
    expect(ok.settings?.entryPages).toEqual(['index.md', 'guide/start.md']);
    expect(ok.settings?.redirects).toEqual([{ from: 'old.md', to: 'new.md' }]);
  });

  it('maps pruning thresholds to their own fields', () => {
    const out = fromForm({ ...toForm(defaultDocSetSettings()), staleDays: '0' });
    expect(out.errors.staleDays).toBeTruthy();
  });
});
