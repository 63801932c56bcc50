/** File formats read and written by Porelith, pure TypeScript for the browser and the server. */
export * from './las';
export * from './csv';
export { decodeText, BINARY_FILE_MESSAGE, type DecodedText, type TextEncodingName } from './decodeText';
export { formatProblem, ProblemList, MAX_LISTED_PROBLEMS, type Problem } from './problem';
