// Types for the part of papaparse that core uses (parsing a string, no files, streams or workers). The published
// @types/papaparse pulls in @types/node, which would let `process` and `Buffer` type-check in core; pointing
// core's tsconfig "paths" for 'papaparse' here keeps core's globals to plain ES.
export interface ParseError {
  type: string;
  code: string;
  message: string;
  row?: number;
  index?: number;
}

export interface ParseMeta {
  delimiter: string;
  linebreak: string;
  aborted: boolean;
  truncated: boolean;
  cursor: number;
}

export interface ParseResult<T> {
  data: T[];
  errors: ParseError[];
  meta: ParseMeta;
}

export interface ParseConfig {
  delimiter?: string;
  newline?: '\r' | '\n' | '\r\n';
  quoteChar?: string;
  header?: false;
  dynamicTyping?: false;
  skipEmptyLines?: boolean | 'greedy';
  delimitersToGuess?: string[];
}

declare const Papa: {
  parse<T>(input: string, config?: ParseConfig): ParseResult<T>;
  readonly BYTE_ORDER_MARK: string;
};

export default Papa;
