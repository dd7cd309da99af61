import type { ActionDefs } from './action-def';
import { acceptJob, handBack, markBuilt, startWork } from './crew-actions';
import {
  askDetails,
  bookVisit,
  cancelVisit,
  rescheduleVisit,
  close,
  decline,
  failInspection,
  filePermit,
  markChecked,
  recordGranted,
  recordRefused,
  release,
  sendBack,
} from './office-actions';
import { answer, submit, withdraw } from './owner-actions';

/**
 * Every action of the shared transition table with what it does on the server. The type asks for every action,
 * so a row added to the table without its entry here does not compile.
 */
export const actionDefs: ActionDefs = {
  submit,
  'ask-details': askDetails,
  answer,
  'book-visit': bookVisit,
  'reschedule-visit': rescheduleVisit,
  'cancel-visit': cancelVisit,
  'mark-checked': markChecked,
  'file-permit': filePermit,
  'record-granted': recordGranted,
  'record-refused': recordRefused,
  release,
  'accept-job': acceptJob,
  'hand-back': handBack,
  'start-work': startWork,
  'mark-built': markBuilt,
  'send-back': sendBack,
  'fail-inspection': failInspection,
  close,
  decline,
  withdraw,
};
