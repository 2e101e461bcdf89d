import { pick, type Random } from '../../modules/demo/generator/prng.js';

const SUBJECTS = [
  'The scheduler',
  'Each workspace',
  'An administrator',
  'The export job',
  'Your access token',
  'The sync agent',
  'A retention rule',
  'The audit log',
  'Every region',
  'The command-line tool',
  'A webhook',
];
const VERBS = ['keeps', 'rejects', 'retries', 'records', 'limits', 'replicates', 'validates', 'caches', 'rotates', 'reports'];
const OBJECTS = [
  'failed deliveries for up to seven days',
  'changes made outside business hours',
  'every request with its caller',
  'snapshots older than the configured window',
  'quota usage per project',
  'keys that have not been used recently',
  'events in the order they arrived',
  'the settings of the parent project',
  'partial uploads until they complete',
  'a summary in the activity feed',
];
const TAILS = [
  '',
  ', unless you change the default',
  ' when the feature flag is on',
  ', which most teams leave as is',
  ' for each member separately',
  ' before the next scheduled run',
];

/** One plausible documentation sentence; ASCII only, so characters equal bytes. */
export function sentence(random: Random): string {
  return `${pick(random, SUBJECTS)} ${pick(random, VERBS)} ${pick(random, OBJECTS)}${pick(random, TAILS)}.`;
}

export function codeBlock(random: Random): string[] {
  const n = 1 + Math.floor(random() * 9);
  return [
    '```sh',
    `synctl project update --retention ${n}d --region eu-${n}`,
    `# see [old docs](old/${n}.md) - not a link inside code`,
    '```',
  ];
}
