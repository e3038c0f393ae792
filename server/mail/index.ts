// What other parts of the server may use from this domain; everything else stays inside it.
export { createMailer, type Mailer, type MailMessage } from './mailer.ts';
export { type MailSink, startMailSink } from './sink.ts';
export { addressCheckMail, invitationMail, passwordResetMail, signUpAgainMail } from './templates.ts';
