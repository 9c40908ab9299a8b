/**
 * The one error type for bad user input anywhere in the engine. `field` names the input at fault (a form field, a
 * command-line flag, a document path such as `loads[2].a_mm`) so the client, the server's error middleware and the
 * `calc` command line can all point at it.
 */
export class InputError extends Error {
  constructor(
    public field: string,
    message: string,
  ) {
    super(message.includes(field) ? message : `${field}: ${message}`);
    this.name = 'InputError';
  }
}
