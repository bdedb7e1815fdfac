import { Callout } from '@blueprintjs/core';

/** The one message a failed form submission shows above its buttons. */
export function FormError({ message, title }: { message?: string | null; title?: string }) {
  if (!message) return null;
  return (
    <Callout intent="danger" title={title} className="tc-form-error" role="alert">
      {message}
    </Callout>
  );
}
