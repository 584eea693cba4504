import { Alert } from '@mantine/core';
import { IconLinkOff } from '@tabler/icons-react';

export function PayLinkNotValid() {
  return (
    <Alert color="brass" icon={<IconLinkOff size={20} />} title="This pay link is not valid">
      A pay link works only exactly as printed on the invoice or sent in its e-mail. Check that the whole link was
      copied, or ask whoever sent the invoice for a new one.
    </Alert>
  );
}
