import { DEPOTS, JARGON, PEOPLE, VERBS, humanize } from './scenario.js';
import { pick, type Random } from './prng.js';

const SENTENCES = [
  'Stewards {verb} the {j} before the depot opens, and {person} keeps the master copy.',
  'At {depot} the {j} sits on the shelf behind the counter, next to the returns shelf.',
  'If a borrower asks about the {j}, {verb} it with them rather than quoting the rule.',
  'We changed how the {j} works after the spring review; {person} wrote up the reasons.',
  'Most questions about the {j} come in on Saturday mornings, when the queue is longest.',
  'The {j} is one of the things new volunteers find confusing, so explain it slowly.',
  '{person} from {depot} suggested we {verb} the {j} weekly instead of monthly.',
  'Write the date on the {j} in pencil; the ink ones smudge in the van.',
  'Nobody should handle the {j} alone on their first shift.',
  'The {j} costs us very little but saves a lot of arguments at the desk.',
  'When in doubt, {verb} the {j} and leave a note in Hatchbook for the next shift.',
  'Partner groups may use the {j} too, as long as a depot host is present.',
];

export const LINK_SENTENCES = [
  'See {L} for the details.',
  '{L} covers this step by step.',
  'Ask at the desk or read {L}.',
  'Most stewards keep {L} open on the desk tablet.',
  'Background is in {L}.',
  'Before you change anything, check {L}.',
  'The short version lives in {L}.',
];

/** One sentence of plain handbook prose in the network's own words, with no link syntax in it. */
export function fillerSentence(random: Random): string {
  return pick(random, SENTENCES)
    .replace('{verb}', pick(random, VERBS))
    .replace('{j}', pick(random, JARGON))
    .replace('{person}', pick(random, PEOPLE))
    .replace('{depot}', `${humanize(pick(random, DEPOTS))} depot`);
}

/** A paragraph as separate source lines (CommonMark joins them), so lines stay short and countable. */
export function fillerParagraph(random: Random, sentences: number): string[] {
  return Array.from({ length: sentences }, () => fillerSentence(random));
}
