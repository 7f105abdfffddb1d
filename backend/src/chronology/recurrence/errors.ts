/** Input a recurrence analysis cannot use; `field` names the offending input for the API layer. */
export class RecurrenceInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'RecurrenceInputError';
  }
}

/** Thrown when a running Monte Carlo sees its `shouldCancel` hook return true. */
export class RecurrenceCancelledError extends Error {
  constructor(readonly completedDraws: number) {
    super(`recurrence analysis cancelled after ${completedDraws} draws`);
    this.name = 'RecurrenceCancelledError';
  }
}
