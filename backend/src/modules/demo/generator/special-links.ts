import { SITE_URL } from './scenario.js';
import type { PlannedLink } from './types.js';
import type { HandbookVersion } from './versions.js';

type Special = PlannedLink & { versions: HandbookVersion[] };
const ALL: HandbookVersion[] = [1, 2, 3];
const FW = 'onboarding/first-week.md';
const LENDING = 'policies/lending-policy.md';

/** Links written on purpose: one of every kind DOMAIN.md names, and the seeded problems with their versions. */
const SPECIALS: Special[] = [
  // Showcase on the first-week page: every way of writing a link.
  { versions: ALL, source: FW, form: 'site-url', status: 'page', target: LENDING, label: 'the lending policy on our website' },
  { versions: ALL, source: FW, form: 'root-absolute', status: 'redirected', target: LENDING, rawHref: '/handbook/policies/borrowing-rules', label: 'the old borrowing rules' },
  { versions: ALL, source: FW, form: 'site-autolink', status: 'page', target: 'policies/deposit-policy.md', label: '' },
  { versions: ALL, source: FW, form: 'relative', status: 'page', target: LENDING, fragment: 'late-returns', label: 'late returns' },
  { versions: ALL, source: FW, form: 'relative', status: 'page', target: 'policies/deposit-policy.md', fragment: 'deposit-bands', label: 'the deposit bands' },
  { versions: ALL, source: FW, form: 'relative', status: 'page', target: 'teams/lending-desk/meeting-notes-2025.md', fragment: 'decisions-1', label: 'the June decisions' },
  { versions: ALL, source: FW, form: 'relative', status: 'page', target: 'policies/key-holding.md', fragment: 'key-register', label: 'the key register' },
  { versions: ALL, source: FW, form: 'inline-raw', status: 'external', rawHref: 'mailto:coordinators@brackenridge-tools.example', label: 'mail the coordinators' },
  { versions: ALL, source: FW, form: 'inline-raw', status: 'external', rawHref: 'tel:+440000000000', label: 'the duty phone' },
  { versions: ALL, source: FW, form: 'autolink', status: 'external', rawHref: 'https://grants.riverbend-council.example/community-fund', label: '' },
  { versions: ALL, source: FW, form: 'bare-url', status: 'external', rawHref: 'https://www.weather-brackenridge.example/forecast', label: '' },
  { versions: ALL, source: FW, form: 'inline-raw', status: 'external', rawHref: 'https://parts.fixers-coop.example/catalogue?ref=btln', label: 'the parts co-op catalogue' },
  { versions: ALL, source: FW, form: 'image', status: 'asset', target: 'assets/depot-map.png', label: 'Map of the nine depots' },
  { versions: ALL, source: FW, form: 'wiki-image', status: 'asset', target: 'assets/depot-map.png', label: '' },
  { versions: ALL, source: FW, form: 'relative', status: 'asset', target: 'assets/bench-check-form.pdf', label: 'the bench check form (PDF)' },
  { versions: ALL, source: FW, form: 'embed', status: 'page', target: 'policies/code-of-conduct.md', label: '' },
  { versions: ALL, source: FW, form: 'wiki-title', status: 'page', target: 'reference/glossary.md', rawHref: 'Jargon buster', label: '' },
  { versions: ALL, source: FW, form: 'wiki-heading', status: 'page', target: LENDING, fragment: 'Late returns', label: '' },
  { versions: ALL, source: FW, form: 'wiki-label', status: 'page', target: 'onboarding/who-to-ask.md', label: 'ask a coordinator' },
  { versions: ALL, source: FW, form: 'reference-collapsed', status: 'page', target: 'policies/safeguarding.md', label: '' },
  { versions: ALL, source: FW, form: 'reference-shortcut', status: 'page', target: 'policies/volunteer-agreement.md', label: '' },
  { versions: ALL, source: FW, form: 'reference-full', status: 'page', target: 'onboarding/depot-tour.md', label: 'the depot tour' },
  { versions: ALL, source: FW, form: 'html', status: 'page', target: 'policies/code-of-conduct.md', label: 'code of conduct' },
  { versions: ALL, source: FW, form: 'inline-raw', status: 'out-of-scope', rawHref: `${SITE_URL}/volunteer-portal/shifts`, label: 'the volunteer portal' },
  { versions: ALL, source: FW, form: 'empty', status: 'self', target: FW, label: 'this page' },
  { versions: ALL, source: FW, form: 'relative', status: 'self', target: FW, fragment: 'what-to-do', label: 'what to do' },
  { versions: ALL, source: 'index.md', form: 'image', status: 'asset', target: 'assets/logo.svg', label: 'Brackenridge logo' },
  // Exactly one ambiguous wiki link, one unsafe link, one missing image.
  { versions: ALL, source: 'onboarding/your-first-steward-shift.md', form: 'wiki', status: 'ambiguous', rawHref: 'checklist', label: '' },
  { versions: ALL, source: 'how-to/lending-desk/print-a-loan-slip.md', form: 'inline-raw', status: 'unsafe', rawHref: 'javascript:void(0)', label: 'print now' },
  { versions: ALL, source: 'how-to/swap-runs/pack-a-swap-crate.md', form: 'image', status: 'broken-asset', rawHref: '../../assets/van-loading-diagram.png', label: 'Van loading diagram' },
  // Broken links.
  { versions: [1], source: 'teams/repair-bench/index.md', form: 'inline-raw', status: 'broken', rawHref: 'soldering-guide.md', label: 'soldering guide (coming soon)' },
  { versions: ALL, source: 'how-to/lending-desk/waive-a-late-fee.md', form: 'inline-raw', status: 'broken', rawHref: '../../policies/overdue-process.md', label: 'the overdue process' },
  { versions: [1], source: 'runbooks/van-breakdown.md', form: 'inline-raw', status: 'broken', rawHref: '/handbook/reference/tools/van-jack', label: 'the van jack sheet' },
  { versions: ALL, source: 'teams/swap-runs/van-rota.md', form: 'wiki', status: 'broken', rawHref: 'Van Rota 2019', label: '' },
  { versions: ALL, source: 'policies/expenses.md', form: 'inline-raw', status: 'broken', rawHref: '../../shared-drive/expense-form.md', label: 'the expense form' },
  { versions: [2], source: 'how-to/catalogue/tag-a-kit.md', form: 'inline-raw', status: 'broken', rawHref: 'print-labels.md', label: 'print the labels' },
  { versions: [3], source: 'reference/depots/index.md', form: 'inline-raw', status: 'broken', rawHref: 'habour-street.md', label: 'Harbour Street opening hours' },
  // Broken anchors, each beside a plain link to the same page so the page graph does not hinge on them.
  { versions: ALL, source: 'how-to/lending-desk/extend-a-loan.md', form: 'relative', status: 'broken-anchor', target: LENDING, fragment: 'grace-period', label: 'the grace period' },
  { versions: ALL, source: 'how-to/lending-desk/extend-a-loan.md', form: 'relative', status: 'page', target: LENDING, label: 'the lending policy' },
  { versions: [1], source: 'onboarding/who-to-ask.md', form: 'wiki-heading', status: 'broken-anchor', target: 'reference/glossary.md', fragment: 'Depot slang', label: '' },
  { versions: [2, 3], source: 'onboarding/who-to-ask.md', form: 'wiki-heading', status: 'page', target: 'reference/glossary.md', fragment: 'Depot words', label: '' },
  { versions: ALL, source: 'onboarding/who-to-ask.md', form: 'relative', status: 'page', target: 'reference/glossary.md', label: 'the glossary' },
  { versions: ALL, source: 'how-to/repair-bench/log-a-repair.md', form: 'relative', status: 'broken-anchor', target: 'how-to/repair-bench/log-a-repair.md', fragment: 'before-you-begin', label: 'the checks above' },
  { versions: [3], source: 'runbooks/power-cut.md', form: 'relative', status: 'broken-anchor', target: 'runbooks/it-outage.md', fragment: 'who-to-call', label: 'who to call' },
  { versions: [3], source: 'runbooks/power-cut.md', form: 'relative', status: 'page', target: 'runbooks/it-outage.md', label: 'the IT outage runbook' },
  // A dead end may still hold links that are not page links: self, external, mail.
  { versions: ALL, source: 'runbooks/fire-alarm.md', form: 'empty', status: 'self', target: 'runbooks/fire-alarm.md', label: 'print this page' },
  { versions: ALL, source: 'runbooks/fire-alarm.md', form: 'relative', status: 'self', target: 'runbooks/fire-alarm.md', fragment: 'afterwards', label: 'afterwards' },
  { versions: ALL, source: 'runbooks/fire-alarm.md', form: 'inline-raw', status: 'external', rawHref: 'mailto:safety@brackenridge-tools.example', label: 'the safety team' },
  { versions: ALL, source: 'policies/privacy-notice.md', form: 'autolink', status: 'external', rawHref: 'https://ico-register.example/entry/BTLN-0042', label: '' },
];

export function specialLinks(version: HandbookVersion, pagePaths: ReadonlySet<string>): PlannedLink[] {
  return SPECIALS.filter((s) => s.versions.includes(version) && pagePaths.has(s.source)).map(({ versions: _v, ...link }) => link);
}
