/**
 * The invented organisation behind the demo handbook: the Brackenridge Tool Library Network, a regional
 * co-operative of nine depots that lend tools, run repair evenings ("fix nights") and move kit between
 * depots by van ("swap runs"). Every name here is made up for Linkloom's demo.
 */
export const ORG = 'Brackenridge Tool Library Network';
export const SITE_URL = 'https://brackenridge-tools.example';
export const BASE_PATH = '/handbook';
export const EDITOR = 'editor@demo.linkloom.test';
export const WRITER = 'writer@demo.linkloom.test';

export const PEOPLE = [
  'Odile Marchetti',
  'Tomasz Eberle',
  'Nia Okafor-Lind',
  'Ruairi Dunmore',
  'Priya Vantongeren',
  'Sefton Alabi',
  'Maren Quist',
  'Joaquim Ferreira-Hale',
  'Ilse Brannagh',
  'Dev Carrow-Singh',
];

export const DEPOTS = [
  'harbour-street',
  'millbrook',
  'north-quarry',
  'saltings',
  'tannery-yard',
  'upper-fell',
  'wickham-green',
  'cobble-lane',
  'station-arches',
];

export const TEAMS: Record<string, string[]> = {
  'lending-desk': ['borrow-cards', 'loan-ledger', 'late-returns-desk', 'deposit-handling', 'kit-bundles', 'queue-etiquette'],
  'repair-bench': ['bench-check', 'red-tag-triage', 'spare-parts-shelf', 'fix-night-format', 'blade-sharpening', 'battery-testing'],
  'swap-runs': ['van-rota', 'route-planning', 'loading-the-van', 'fuel-cards', 'swap-run-manifest', 'winter-driving'],
  membership: ['sliding-scale-fees', 'member-welcome-pack', 'renewals', 'member-survey', 'youth-borrowers', 'accessibility-requests'],
  fundraising: ['grant-calendar', 'donor-thank-yous', 'tool-amnesty-day', 'sponsor-packs', 'gift-aid-notes', 'crowdfund-2026'],
  catalogue: ['hatchbook-overview', 'barcode-scheme', 'photo-guidelines', 'category-tree', 'stocktake-reports', 'api-tokens'],
  safety: ['ppe-store', 'incident-reporting', 'first-aid-kits', 'electrical-testing', 'ladder-loans', 'risk-assessments'],
  'depot-hosts': ['opening-up', 'closing-down', 'key-holders', 'host-rota', 'signage', 'visitor-log'],
};

export const HOW_TO: Record<string, string[]> = {
  'lending-desk': [
    'check-out-a-tool',
    'check-in-a-returned-tool',
    'extend-a-loan',
    'take-a-deposit',
    'refund-a-deposit',
    'reserve-a-kit',
    'handle-a-lost-tool',
    'sign-up-a-walk-in',
    'print-a-loan-slip',
    'merge-duplicate-members',
    'waive-a-late-fee',
    'lend-to-a-partner-group',
    'close-the-till',
    'log-a-complaint',
    'run-the-lending-desk-alone',
    'fax-a-loan-receipt',
    'checklist',
  ],
  'repair-bench': [
    'sharpen-a-chisel',
    'replace-a-mower-blade',
    'test-a-drill-battery',
    'red-tag-a-tool',
    'clear-a-red-tag',
    'order-spare-parts',
    'run-a-fix-night',
    'recruit-fixers',
    'log-a-repair',
    'dispose-of-a-broken-tool',
    'calibrate-the-torque-wrench',
    'checklist',
  ],
  catalogue: [
    'add-a-tool-to-hatchbook',
    'photograph-a-tool',
    'print-labels',
    'retire-a-tool',
    'move-a-tool-between-depots',
    'fix-a-barcode-clash',
    'export-the-catalogue',
    'bulk-import',
    'bulk-import-csv-columns',
    'tag-a-kit',
    'find-a-missing-tool',
    'run-a-stocktake',
  ],
  'swap-runs': ['book-the-van', 'pack-a-swap-crate', 'report-van-damage', 'claim-mileage', 'plan-a-swap-run', 'drive-the-north-loop'],
};

export const POLICIES = [
  'lending-policy',
  'deposit-policy',
  'late-returns-policy',
  'safeguarding',
  'privacy-notice',
  'volunteer-agreement',
  'code-of-conduct',
  'key-holding',
  'cash-handling',
  'data-retention',
  'expenses',
  'conflicts-of-interest',
  'complaints',
  'insurance',
  'lone-working',
  'photography-consent',
  'social-media',
  'tool-donations',
  'equipment-disposal',
  'accessibility',
  'whistleblowing',
  'travel',
  'youth-borrowing',
  'partner-groups',
];

export const TOOLS = [
  'angle-grinder',
  'belt-sander',
  'circular-saw',
  'cordless-drill',
  'hedge-trimmer',
  'jigsaw',
  'ladder-3m',
  'lawn-mower',
  'mitre-saw',
  'plate-compactor',
  'pressure-washer',
  'router',
  'sewing-machine',
  'soldering-station',
  'tile-cutter',
  'wallpaper-steamer',
  'wheelbarrow',
  'carpet-cleaner',
  'chainsaw',
  'post-hole-digger',
  'scaffold-tower',
  'dehumidifier',
  'log-splitter',
  'rotavator',
  'stud-finder',
  'laser-level',
  'staple-gun',
  'bike-stand',
  'spray-gun',
  'oscillating-multi-tool',
];

export const JARGON = [
  'bench check',
  'red tag',
  'swap run',
  'borrow card',
  'loan ledger',
  'fix night',
  'kit bundle',
  'depot host',
  'Hatchbook',
  'sliding scale',
  'tool amnesty',
  'steward shift',
  'returns shelf',
  'parts bin',
];

export const VERBS = ['check', 'record', 'agree', 'confirm', 'note', 'share', 'review', 'update', 'escalate', 'hand over'];

/** Turns a file stem like `check-in-a-returned-tool` into `Check in a returned tool`. */
export function humanize(stem: string): string {
  const words = stem.replace(/-/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
