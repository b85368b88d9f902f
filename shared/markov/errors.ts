/**
 * The one error type of the Markov engine's readers and validators. Its message says what is wrong,
 * where (line, row, column or state) and how to fix it; the server maps it to HTTP 400 and the CLI
 * to exit code 2.
 */
export class MarkovInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MarkovInputError';
  }
}
