import type { DehydratedState } from '@tanstack/react-query';

/** The id of the data block that carries a first HTML's data to the browser. */
export const FIRST_HTML_DATA_ID = 'vatside-first-html';

/** What the first HTML was written from: the API answers, and the zone its times are in. */
export interface FirstHtmlData {
  queries: DehydratedState;
  timeZone: string;
}
