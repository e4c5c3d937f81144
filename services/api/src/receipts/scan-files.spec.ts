import { cleanDisplayName, inlineDisposition } from './scan-files';

describe('cleanDisplayName', () => {
  it('drops folders, including ../ and Windows paths', () => {
    expect(cleanDisplayName('../../etc/label.png', 'png')).toBe('label.png');
    expect(cleanDisplayName('C:\\Users\\maker\\label.png', 'png')).toBe('label.png');
  });

  it('drops control and direction characters and leading dots', () => {
    expect(cleanDisplayName('la\u0000bel\u202E.png', 'png')).toBe('label.png');
    expect(cleanDisplayName('..hidden.pdf', 'pdf')).toBe('hidden.pdf');
  });

  it('ends the name with the extension of what the file is', () => {
    expect(cleanDisplayName('label.exe', 'png')).toBe('label.exe.png');
    expect(cleanDisplayName('photo.JPEG', 'jpg')).toBe('photo.JPEG');
    expect(cleanDisplayName('', 'pdf')).toBe('scan.pdf');
    expect(cleanDisplayName(undefined, 'webp')).toBe('scan.webp');
  });

  it('keeps at most 255 characters, the extension included', () => {
    const name = cleanDisplayName(`${'a'.repeat(300)}.exe`, 'png');
    expect([...name]).toHaveLength(255);
    expect(name.endsWith('.png')).toBe(true);
  });
});

describe('inlineDisposition', () => {
  it('gives an ASCII fallback and the exact UTF-8 name', () => {
    expect(inlineDisposition('Étiquette "1".png')).toBe(
      `inline; filename="_tiquette _1_.png"; filename*=UTF-8''%C3%89tiquette%20%221%22.png`,
    );
  });
});
