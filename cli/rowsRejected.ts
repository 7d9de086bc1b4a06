/**
 * Thrown by a command after its output is written whole when some input rows could not be
 * used: the run did its job for the good rows, and main() turns this into exit code 3 with
 * the message as the last stderr line.
 */
export class RowsRejected extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'RowsRejected';
  }
}
