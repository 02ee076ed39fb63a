import { attachmentDisposition } from './content-disposition.js';

describe('attachmentDisposition (RFC 6266 with RFC 5987 filename*)', () => {
  it('keeps a plain ASCII name as it is', () => {
    expect(attachmentDisposition('splice-A.json')).toBe('attachment; filename="splice-A.json"');
  });

  it('adds filename* in UTF-8 for any other name, with an ASCII fallback', () => {
    expect(attachmentDisposition('Träger.json')).toBe(
      `attachment; filename="Tr_ger.json"; filename*=UTF-8''Tr%C3%A4ger.json`,
    );
    expect(attachmentDisposition("梁 (it's).json")).toBe(
      `attachment; filename="_ (it's).json"; filename*=UTF-8''%E6%A2%81%20%28it%27s%29.json`,
    );
  });

  it('never lets quotes, backslashes or line breaks into the header', () => {
    const header = attachmentDisposition('a"b\\c\r\nd.json');
    expect(header).toBe(`attachment; filename="a_b_c__d.json"; filename*=UTF-8''a%22b%5Cc%0D%0Ad.json`);
  });

  it('encodes a lone surrogate as U+FFFD instead of throwing', () => {
    expect(attachmentDisposition('x\uD800.json')).toContain(`filename*=UTF-8''x%EF%BF%BD.json`);
  });
});
