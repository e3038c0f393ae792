import { sheetCautions } from '../../shared/target-sheet/cautions.ts';
import type { MailMessage } from '../mail/index.ts';

// Plain-text mails about damper target sheets. Each returns everything but the recipient.
type Template = Omit<MailMessage, 'to'>;

interface SheetMailArgs {
  /** `TS-…` */
  number: string;
  setupName: string;
  revision: number;
  workspaceName: string;
  /** Link to the sheet's page. */
  link: string;
}

const footer = '\n-- \nRidewright, the ride and damping workbench.\nYou get this because of your role in the workspace named above.\n';

const identity = (a: SheetMailArgs) => `${a.number} (${a.setupName}, revision ${a.revision}) in "${a.workspaceName}"`;

/** To every lead of the workspace when a sheet is submitted. */
export function sheetSubmittedMail(a: SheetMailArgs & { by: string }): Template {
  return {
    subject: `Target sheet ${a.number} is waiting for your review`,
    text:
      `Hello,\n\n${a.by} submitted the damper target sheet ${identity(a)} for review.\n\n` +
      `Open it to release it or send it back with a reason:\n\n${a.link}\n\n` +
      `${sheetCautions.release}\n` +
      footer,
  };
}

/** To the author when a lead or admin releases the sheet. */
export function sheetReleasedMail(a: SheetMailArgs & { by: string }): Template {
  return {
    subject: `Target sheet ${a.number} was released`,
    text:
      `Hello,\n\n${a.by} released the damper target sheet ${identity(a)}.\n\n` +
      `It is now final: changes need a new sheet that supersedes it.\n${sheetCautions.release.split('.')[0]}.\n\n${a.link}\n` +
      footer,
  };
}

/** To the author when a lead or admin sends the sheet back. */
export function sheetReturnedMail(a: SheetMailArgs & { by: string; reason: string }): Template {
  return {
    subject: `Target sheet ${a.number} was sent back`,
    text:
      `Hello,\n\n${a.by} sent the damper target sheet ${identity(a)} back with this reason:\n\n` +
      `${a.reason
        .split('\n')
        .map((l) => `  > ${l}`)
        .join('\n')}\n\nEdit the draft and submit it again:\n\n${a.link}\n` +
      footer,
  };
}
