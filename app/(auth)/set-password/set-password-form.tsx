'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import { apiFetch } from '../../_components/api-client';
import { FormField, FormMessage } from '../../_components/form-field';

const schema = yup.object({
  password: yup.string().min(10, 'Use at least 10 characters').max(200, 'At most 200 characters').required('Password is required'),
  confirm: yup
    .string()
    .oneOf([yup.ref('password')], 'The two entries differ')
    .required('Type the password again'),
});

export function SetPasswordForm({ token }: { token: string }) {
  const [message, setMessage] = useState<string | null>(token ? null : 'This page needs the link from your invitation e-mail.');
  return (
    <div className="w-full max-w-sm">
      <h1 className="page-title">Choose your password</h1>
      <p className="mt-1 mb-6 text-ink-soft">At least 10 characters. A short sentence is easy to remember and hard to guess.</p>
      <Formik
        initialValues={{ password: '', confirm: '' }}
        validationSchema={schema}
        onSubmit={async (values) => {
          setMessage(null);
          const res = await apiFetch('/api/v1/invitations/accept', { method: 'POST', body: { token, password: values.password } });
          if (res.ok) {
            window.location.assign('/');
            return;
          }
          setMessage(res.fields.password ?? res.message);
        }}
      >
        {({ isSubmitting }) => (
          <ReadyForm noValidate className="space-y-4">
            <FormField name="password" type="password" label="New password" autoComplete="new-password" autoFocus />
            <FormField name="confirm" type="password" label="Same password again" autoComplete="new-password" />
            <FormMessage message={message} />
            <button type="submit" className="btn-primary w-full" disabled={isSubmitting || !token}>
              {isSubmitting ? 'Saving…' : 'Save and sign in'}
            </button>
          </ReadyForm>
        )}
      </Formik>
    </div>
  );
}
