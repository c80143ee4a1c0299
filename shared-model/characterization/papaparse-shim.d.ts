/**
 * The few papaparse types Pairwright uses. `@types/papaparse` pulls in Node's global types, which would
 * quietly give the pure shared-model project `process`, `Buffer` and friends; importing the library's
 * file directly with this small declaration keeps shared-model free of Node types.
 */
declare module 'papaparse/papaparse.js' {
  export interface ParseError {
    type: string;
    code: string;
    message: string;
    row?: number;
  }
  export interface ParseResult {
    data: string[][];
    errors: ParseError[];
    meta: { delimiter: string; linebreak: string; aborted: boolean; truncated: boolean };
  }
  export interface ParseConfig {
    delimiter?: string;
    newline?: string;
    quoteChar?: string;
    header?: false;
    dynamicTyping?: false;
    skipEmptyLines?: boolean | 'greedy';
    delimitersToGuess?: string[];
  }
  const Papa: { parse(input: string, config?: ParseConfig): ParseResult };
  export default Papa;
}
