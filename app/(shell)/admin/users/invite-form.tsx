'use client';

import { Field, Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import { ROLE_LABELS, ROLES, type Role } from '@/lib/roles';
import type { UserDto } from '@/lib/contracts/users';
import { apiFetch } from '../../../_components/api-client';
import { FormField, FormMessage } from '../../../_components/form-field';

const schema = yup.object({
  name: yup.string().trim().max(120, 'At most 120 characters').required('Name is required'),
  email: yup.string().trim().email('Enter a valid e-mail address').required('E-mail is required'),
  role: yup
    .mixed<Role>()
    .oneOf([...ROLES], 'Pick a role')
    .required('Pick a role'),
});

export function InviteForm({ onInvited }: { onInvited: (user: UserDto, mail: string) => void }) {
  const [message, setMessage] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ name: '', email: '', role: 'operator' as Role }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const res = await apiFetch<{ user: UserDto; mail: string }>('/api/v1/users', { method: 'POST', body: values });
        if (res.ok) {
          onInvited(res.data.user, res.data.mail);
          helpers.resetForm();
          return;
        }
        helpers.setErrors(res.fields);
        setMessage(res.message);
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_12rem_auto] lg:items-start" aria-label="Invite someone">
          <FormField name="name" label="Name" autoComplete="off" />
          <FormField name="email" type="email" label="E-mail" autoComplete="off" />
          <div>
            <label htmlFor="f-role" className="field-label">
              Role
            </label>
            <Field as="select" id="f-role" name="role" className="field">
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABELS[r]}
                </option>
              ))}
            </Field>
          </div>
          <div className="lg:pt-6">
            <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
              {isSubmitting ? 'Sending…' : 'Send invitation'}
            </button>
          </div>
          <div className="lg:col-span-4">
            <FormMessage message={message} />
          </div>
        </ReadyForm>
      )}
    </Formik>
  );
}
