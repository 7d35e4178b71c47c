'use client';

import { Form } from 'formik';
import { useEffect, useRef, useSyncExternalStore, type ComponentProps } from 'react';

const noSubscription = () => () => {};

// A Formik form whose fields and buttons wait for the page's script. Typed into or pressed before
// hydration, a form would be posted by the browser itself (the password in the address bar) or its
// values lost to Formik's empty state; disabled until then, the browser holds keys and clicks back.
// The layout classes go on the fieldset, which holds every field of the form.
export function ReadyForm({ children, className, method = 'post', ...props }: ComponentProps<typeof Form>) {
  const ready = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  const fields = useRef<HTMLFieldSetElement>(null);
  useEffect(() => {
    // The server-rendered autofocus found the field still disabled: give it focus now.
    if (ready && !fields.current?.contains(document.activeElement)) fields.current?.querySelector<HTMLElement>('[autofocus]')?.focus();
  }, [ready]);
  return (
    <Form method={method} {...props}>
      <fieldset ref={fields} disabled={!ready} aria-busy={!ready} className={`min-w-0 ${className ?? ''}`}>
        {children}
      </fieldset>
    </Form>
  );
}
