/** The id of the data block that carries a first HTML's API answers to the browser. */
export const FIRST_HTML_QUERIES_ID = 'vatside-first-html-queries';
