import { createTransport, type Transporter } from 'nodemailer';
import { MailSender, type OutgoingMail } from './mail-sender';

/** Sends through nodemailer to an SMTP server: the configured one, or the in-process catcher. */
export class SmtpMailSender extends MailSender {
  constructor(
    private readonly transport: Transporter,
    private readonly from: string,
  ) {
    super();
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({
      from: this.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
    });
  }

  static toUrl(url: string, from: string): SmtpMailSender {
    return new SmtpMailSender(createTransport(url), from);
  }

  static toCatcher(port: number, from: string): SmtpMailSender {
    return new SmtpMailSender(
      createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true }),
      from,
    );
  }
}
