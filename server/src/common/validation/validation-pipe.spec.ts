import type { ValidationError } from '@nestjs/common';
import { fieldMessages } from './validation-pipe';

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
