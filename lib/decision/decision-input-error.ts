/**
 * Bad input to a decision calculation (a negative weight, mixed currencies). Carries the field so
 * a form can show the message beside it; nothing is computed from input that fails.
 */
export class DecisionInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'DecisionInputError';
  }
}
