import { parseMessage } from './parse-message.js';

describe('parseMessage', () => {
  it('reads headers, unfolds them and decodes quoted-printable bodies and encoded words', () => {
    const raw = [
      'From: Ligament <no-reply@ligament.example.test>',
      'To: priya@fennick-ode.example.test',
      'Subject: =?UTF-8?Q?Submittal_checked_=E2=80=94_SP?=',
      ' -1',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Net area 5.75 in=C2=B2 =',
      'recomputed.',
    ].join('\r\n');
    expect(parseMessage(raw)).toEqual({
      from: 'Ligament <no-reply@ligament.example.test>',
      to: 'priya@fennick-ode.example.test',
      subject: 'Submittal checked — SP -1',
      text: 'Net area 5.75 in² recomputed.',
    });
  });

  it('keeps a 7bit body as it is', () => {
    expect(parseMessage('Subject: Hi\r\n\r\nPlain body\r\n').text).toBe('Plain body');
  });
});
