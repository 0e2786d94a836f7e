/** An invented entry for component tests: two versions of one objection, with a worksheet. */
import { renderMarkdown } from '@/shared/markdown';
import { entryContentSchema, type EntryContent } from '@/shared/entries/schema';
import type { EntryResponse, EntryVersionDto } from '@/shared/api-types';

export const version1: EntryContent = entryContentSchema.parse({
  title: 'Thrust from light kept in a box',
  aliases: ['sealed-cavity drive'],
  mechanismClass: 'enclosed-radiation',
  laws: ['linear-momentum'],
  inBrief: 'Light bouncing inside a closed box cannot push the box: its momentum $p = E/c$ stays inside.',
  howItIsPitched: 'A sealed copper cavity said to push itself on *microwaves alone*.',
  whyItFails: 'Each reflection gives the wall $2E/c$, and the opposite wall takes it back.',
  worksheets: [
    {
      name: 'cavity-bound',
      title: 'The photon bound',
      inputs: [{ name: 'P', label: 'Microwave power', unit: 'kW', default: '1 kW' }],
      steps: [{ name: 'F_bound', label: 'Most thrust light can give', expression: 'P / c', unit: 'uN' }],
    },
  ],
  whatFakesTheEffect: 'Heating of the balance arm.',
  repliesAndAnswers: [{ reply: 'The cavity is tapered.', answer: 'Tapering changes where the walls are, not the sum.' }],
  questionsToAsk: ['Was the run repeated with the device turned round?'],
  cautions: 'High-power microwaves **burn**; follow\nlocal RF safety rules.',
  related: ['photon-rocket'],
  sources: [
    {
      csl: { id: 'halliday', type: 'book', title: 'Fundamentals of Physics', author: [{ family: 'Halliday' }], issued: { 'date-parts': [[2013]] } },
      note: 'Radiation pressure.',
    },
  ],
});

export const version2: EntryContent = {
  ...version1,
  whyItFails: 'Each reflection gives the far wall $2E/c$, and the near wall takes it back.',
  questionsToAsk: [...version1.questionsToAsk, 'What did a dummy load show?'],
};

const person = (id: number, displayName: string) => ({ id, displayName });

export function versionDto(number: number, content: EntryContent): EntryVersionDto {
  return {
    number,
    changeNote: number === 1 ? 'First published version.' : 'Sharper wording of the objection.',
    publishedAt: `2026-0${number}-10T09:00:00.000Z`,
    author: person(3, 'Imre Castellanos'),
    reviewer: person(4, 'Talia Verhoeven'),
    content,
    html: {
      inBrief: renderMarkdown(content.inBrief),
      howItIsPitched: renderMarkdown(content.howItIsPitched),
      whyItFails: renderMarkdown(content.whyItFails),
      whatFakesTheEffect: renderMarkdown(content.whatFakesTheEffect),
      cautions: renderMarkdown(content.cautions),
      replies: content.repliesAndAnswers.map((r) => ({ reply: renderMarkdown(r.reply), answer: renderMarkdown(r.answer) })),
    },
  };
}

export const entryResponse = (number: number, content: EntryContent): EntryResponse => ({
  entry: { slug: 'light-in-a-box', status: 'published', title: content.title, latestVersion: number },
  version: versionDto(number, content),
});
