import type { PagePlan } from './types.js';

export type HandbookVersion = 1 | 2 | 3;

/** How the handbook's structure differs from one version to the next (later in time: pages come and go). */
export interface VersionChanges {
  addPages: Array<[string, PagePlan['kind']]>;
  removePages: string[];
  renamePages: Array<[string, string]>;
  /** Pages that link to no other page (their section index still lists them). */
  deadEnds: string[];
  /** Pages no index lists and nothing links to; each keeps one link out to the handbook. */
  orphans: string[];
  /** Closed groups of pages that only link among themselves. */
  islands: string[][];
  /** Chains below a listed page: each page is linked only from the one before it, so they end up deep. */
  deepChains: string[][];
}

const KIOSK = [
  'reference/legacy-kiosk/index.md',
  'reference/legacy-kiosk/kiosk-setup.md',
  'reference/legacy-kiosk/kiosk-receipt-printer.md',
  'reference/legacy-kiosk/kiosk-offline-mode.md',
];
const GALA = ['teams/fundraising/gala-2027/plan.md', 'teams/fundraising/gala-2027/budget.md', 'teams/fundraising/gala-2027/volunteers.md'];
const VAN_CHAIN = [
  'runbooks/vehicles/van-fleet/brake-service.md',
  'runbooks/vehicles/van-fleet/brake-service-rear-hub.md',
  'runbooks/vehicles/van-fleet/rear-hub-bearing-press.md',
];
const IMPORT_CHAIN = ['how-to/catalogue/bulk-import.md', 'how-to/catalogue/bulk-import-csv-columns.md'];
const DEAD_ENDS_V1 = [
  'reference/tools/angle-grinder.md',
  'reference/tools/chainsaw.md',
  'policies/privacy-notice.md',
  'runbooks/fire-alarm.md',
  'teams/safety/ppe-store.md',
];
const ORPHANS_V1 = [
  'archive/2018-depot-keys.md',
  'archive/2019-van-rota.md',
  'archive/2020-fix-night-poster.md',
  'how-to/lending-desk/fax-a-loan-receipt.md',
];

export const VERSION_CHANGES: Record<HandbookVersion, VersionChanges> = {
  1: {
    addPages: [],
    removePages: [],
    renamePages: [],
    deadEnds: DEAD_ENDS_V1,
    orphans: ORPHANS_V1,
    islands: [KIOSK],
    deepChains: [VAN_CHAIN, IMPORT_CHAIN],
  },
  2: {
    addPages: [
      ['teams/repair-bench/soldering-guide.md', 'how-to'],
      ['how-to/repair-bench/fix-a-sewing-machine-tension.md', 'how-to'],
      ['how-to/catalogue/merge-two-records.md', 'how-to'],
      ['onboarding/remote-volunteering.md', 'page'],
    ],
    removePages: ['archive/2018-depot-keys.md'],
    renamePages: [['how-to/catalogue/print-labels.md', 'how-to/catalogue/print-shelf-labels.md']],
    deadEnds: DEAD_ENDS_V1.filter((p) => p !== 'policies/privacy-notice.md'),
    orphans: ORPHANS_V1.filter((p) => p !== 'archive/2018-depot-keys.md'),
    islands: [KIOSK],
    deepChains: [VAN_CHAIN, IMPORT_CHAIN],
  },
  3: {
    addPages: [
      ['teams/repair-bench/soldering-guide.md', 'how-to'],
      ['how-to/repair-bench/fix-a-sewing-machine-tension.md', 'how-to'],
      ['how-to/catalogue/merge-two-records.md', 'how-to'],
      ['onboarding/remote-volunteering.md', 'page'],
      ['how-to/swap-runs/charge-the-e-van.md', 'how-to'],
      ['how-to/swap-runs/e-van-range-planning.md', 'how-to'],
      ['policies/e-van-charging.md', 'policy'],
      ...GALA.map((p): [string, PagePlan['kind']] => [p, 'page']),
    ],
    removePages: ['archive/2018-depot-keys.md', 'archive/2020-fix-night-poster.md', 'runbooks/snow-closure.md'],
    renamePages: [['how-to/catalogue/print-labels.md', 'how-to/catalogue/print-shelf-labels.md']],
    deadEnds: [...DEAD_ENDS_V1.filter((p) => p !== 'policies/privacy-notice.md'), 'how-to/catalogue/retire-a-tool.md'],
    orphans: ['archive/2019-van-rota.md', 'how-to/lending-desk/fax-a-loan-receipt.md', 'how-to/swap-runs/e-van-range-planning.md'],
    islands: [GALA],
    deepChains: [VAN_CHAIN, IMPORT_CHAIN],
  },
};
