'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import { apiFetch } from '../../_components/api-client';
import { FormField, FormMessage } from '../../_components/form-field';

const schema = yup.object({
  email: yup.string().trim().email('Enter a valid e-mail address').required('E-mail is required'),
  password: yup.string().required('Password is required'),
});

export function SignInForm({ next }: { next: string }) {
  const [message, setMessage] = useState<string | null>(null);
  return (
    <div className="w-full max-w-sm">
      <h1 className="page-title">Sign in</h1>
      <p className="mt-1 mb-6 text-ink-soft">Use the e-mail address your administrator invited.</p>
      <Formik
        initialValues={{ email: '', password: '' }}
        validationSchema={schema}
        onSubmit={async (values, helpers) => {
          setMessage(null);
          const res = await apiFetch('/api/v1/session', { method: 'POST', body: values });
          if (res.ok) {
            window.location.assign(next);
            return;
          }
          helpers.setErrors(res.fields);
          setMessage(res.message);
        }}
      >
        {({ isSubmitting }) => (
          <ReadyForm noValidate className="space-y-4">
            <FormField name="email" type="email" label="E-mail" autoComplete="username" autoFocus />
            <FormField name="password" type="password" label="Password" autoComplete="current-password" />
            <FormMessage message={message} />
            <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
              {isSubmitting ? 'Signing in…' : 'Sign in'}
            </button>
          </ReadyForm>
        )}
      </Formik>
    </div>
  );
}
