import { afterAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../config.ts';
import { uniqueRecipient, waitForMail } from '../test-support/mail-catcher.ts';
import { createMailer } from './mailer.ts';

describe('mailer over real SMTP to the mail catcher', () => {
  const mailer = createMailer(loadConfig());
  afterAll(() => mailer.close());

  it('delivers a message that can be read back from the inbox API', async () => {
    const to = uniqueRecipient('mailer');
    await mailer.send({
      to,
      subject: 'Prep list for Saturday',
      text: 'Soak the skein for 30 minutes.',
    });
    const mail = await waitForMail(to);
    expect(mail.subject).toBe('Prep list for Saturday');
    expect(mail.text).toContain('Soak the skein for 30 minutes.');
  });
});
