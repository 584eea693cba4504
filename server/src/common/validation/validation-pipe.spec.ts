import { BadRequestException, type ArgumentMetadata, type ValidationError } from '@nestjs/common';
import { IsOptional, IsString } from 'class-validator';
import { createValidationPipe, fieldMessages } from './validation-pipe';
import { BIDI_CONTROL_MESSAGE, BROKEN_UNICODE_MESSAGE, NUL_MESSAGE } from './unsafe-input';

class NoteDto {
  @IsString()
  text: string;

  @IsOptional()
  @IsString()
  author?: string;
}

describe('fieldMessages', () => {
  it('names nested fields by their path', () => {
    const errors: ValidationError[] = [
      { property: 'email', constraints: { isEmail: 'email must be an email' }, children: [] },
      {
        property: 'address',
        children: [{ property: 'city', constraints: { isNotEmpty: 'city should not be empty' }, children: [] }],
      },
    ];
    expect(fieldMessages(errors)).toEqual({
      email: ['email must be an email'],
      'address.city': ['city should not be empty'],
    });
  });
});

describe('createValidationPipe', () => {
  const sut = createValidationPipe();
  const body: ArgumentMetadata = { type: 'body', metatype: NoteDto };
  const refusal = async (value: unknown, metadata: ArgumentMetadata = body) => {
    const error: unknown = await sut.transform(value, metadata).then(
      () => undefined,
      (thrown: unknown) => thrown,
    );
    expect(error).toBeInstanceOf(BadRequestException);
    return (error as BadRequestException).getResponse() as { message: string; fields?: Record<string, string[]> };
  };

  it('passes a clean body through as the DTO', async () => {
    await expect(sut.transform({ text: 'Café ✂️ شحذ מספריים' }, body)).resolves.toBeInstanceOf(NoteDto);
  });

  it('refuses direction overrides and isolates, which make a name show other than it reads', async () => {
    // The characters as Unicode Standard Annex #9 (the bidirectional algorithm) lists them: LRE, RLE, PDF, LRO,
    // RLO (U+202A-U+202E) and LRI, RLI, FSI, PDI (U+2066-U+2069).
    const controls = ['\u202A', '\u202B', '\u202C', '\u202D', '\u202E', '\u2066', '\u2067', '\u2068', '\u2069'];
    for (const control of controls) {
      expect((await refusal({ text: `Salon ${control}gnp.exe` })).fields).toEqual({ text: [BIDI_CONTROL_MESSAGE] });
    }
    // The marks next to them (LRM U+200E, RLM U+200F) only nudge neutral characters and stay allowed.
    await expect(sut.transform({ text: 'Salon \u200F(demo)' }, body)).resolves.toBeInstanceOf(NoteDto);
  });

  it('refuses NUL characters and lone surrogates, naming the field', async () => {
    expect((await refusal({ text: 'a\u0000b', author: 'x\ud800' })).fields).toEqual({
      text: [NUL_MESSAGE],
      author: [BROKEN_UNICODE_MESSAGE],
    });
  });

  it('refuses them in nested values, queries and path values too', async () => {
    expect((await refusal({ text: 'ok', extra: [{ deep: '\u0000' }] })).fields).toMatchObject({
      'extra.0.deep': [NUL_MESSAGE],
    });
    expect((await refusal({ q: 'a\u0000' }, { type: 'query', metatype: Object })).fields).toEqual({
      q: [NUL_MESSAGE],
    });
    expect((await refusal('KR-\u0000', { type: 'param', metatype: String, data: 'tagCode' })).fields).toEqual({
      tagCode: [NUL_MESSAGE],
    });
  });

  it('refuses __proto__ and constructor keys, which would swap the DTO for another object', async () => {
    const polluted = JSON.parse('{"text":"ok","__proto__":{"admin":true},"constructor":{"prototype":{}}}') as object;
    expect(Object.keys((await refusal(polluted)).fields ?? {})).toEqual(
      expect.arrayContaining(['__proto__', 'constructor', 'constructor.prototype']),
    );
  });

  it('refuses a list where one object is expected', async () => {
    expect((await refusal([{ text: 'ok' }])).message).toMatch(/one JSON object/);
  });
});
