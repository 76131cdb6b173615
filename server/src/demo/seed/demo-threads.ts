/** Who in the demo cast speaks. */
export type DemoSpeaker = 'lead' | 'coAuthor' | 'reviewer' | 'reader';

/** One open review thread of the demo, on a figure of an example notebook (index into EXAMPLE_NOTEBOOK_FILES). */
export interface DemoThread {
  notebook: number;
  figureId: string;
  author: DemoSpeaker;
  body: string;
  mentions: DemoSpeaker[];
  replies: { author: DemoSpeaker; body: string; mentions: DemoSpeaker[] }[];
}

/** The demo's open threads: a reviewer's questions, a co-author's answer with an @-mention. */
export const DEMO_THREADS: readonly DemoThread[] = [
  {
    notebook: 0,
    figureId: 'fig-lag-flux',
    author: 'reviewer',
    body:
      'The p-value is computed with the effective sample size, good. Could the caption say how many effective pairs remain at the peak lag? ' +
      'Both series are strongly autocorrelated, and a reader will want to see that the significance does not rest on 500 monthly pairs.',
    mentions: [],
    replies: [
      {
        author: 'coAuthor',
        body: '@Ilse Marrow the figure offers N_eff as a live number; shall I add it to the sentence under the lag figure?',
        mentions: ['lead'],
      },
    ],
  },
  {
    notebook: 0,
    figureId: 'fig-budget',
    author: 'coAuthor',
    body:
      'The residual is small, but it is the closure of the run’s own diagnostics, not an observational budget. ' +
      'I would say so in the text before anyone reads the terms as measured fluxes.',
    mentions: [],
    replies: [],
  },
  {
    notebook: 1,
    figureId: 'fig-base-early',
    author: 'reviewer',
    body: 'Does the earlier base period change which months count as events, or only the amplitudes? @Tavi Okonjo, could you check the event count for both?',
    mentions: ['coAuthor'],
    replies: [],
  },
];
