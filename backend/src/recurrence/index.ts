/** What other modules may use of recurrence analyses. */
export { RECURRENCE_CAUTION } from './recurrence-caution';
export { RecurrenceModule } from './recurrence.module';
