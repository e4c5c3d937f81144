export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/** The one interface the app sends e-mail through; SMTP behind it, a catcher in development. */
export abstract class MailSender {
  abstract send(mail: OutgoingMail): Promise<void>;
}
