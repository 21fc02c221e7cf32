import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { contractText } from '../lib/contract-rules';
import { UNIT_SYSTEMS, VACUUM_UNITS, updateMeBody, type VacuumUnit } from '@hoopline/contract';
import { vacuumUnitOf } from '@hoopline/present';
import { useMe, useUpdateMe } from '../api/session';
import { Button } from '../components/button';
import { FormError, FormikSelectField, FormikTextField } from '../components/field';
import { PageHeader, Panel } from '../components/page';
import { serverFieldErrors } from '../components/server-errors';
import { ThemeSwitch } from '../components/theme-switch';
import { PasswordForm } from '../features/account/password-form';
import { ROLE_LABEL } from '../components/badges';

export function AccountRoute() {
  const me = useMe();
  const update = useUpdateMe();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  return (
    <>
      <PageHeader title="Account" subtitle={me.user.email} />
      <div className="grid gap-4 lg:grid-cols-2">
        <Panel title="Profile and display" id="profile">
          <Formik
            initialValues={{
              name: me.user.name,
              unitSystem: me.user.unitSystem,
              // '' for "the unit system's own" (null on the server).
              vacuumUnit: (me.user.vacuumUnit ?? '') as VacuumUnit | '',
            }}
            validationSchema={yup.object({
              name: contractText(updateMeBody.shape.name, 'Your name', 'Enter your name'),
              unitSystem: yup.string().oneOf(UNIT_SYSTEMS).required(),
              vacuumUnit: yup
                .string()
                .oneOf(['', ...VACUUM_UNITS], 'Choose torr, mTorr, mbar or Pa'),
            })}
            onSubmit={async (values, helpers) => {
              setFormError(null);
              setSaved(false);
              try {
                await update.mutateAsync({
                  name: values.name.trim(),
                  unitSystem: values.unitSystem,
                  vacuumUnit: values.vacuumUnit === '' ? null : values.vacuumUnit,
                });
                setSaved(true);
              } catch (error) {
                const mapped = serverFieldErrors(error, ['name', 'unitSystem', 'vacuumUnit']);
                helpers.setErrors(mapped.fields);
                setFormError(mapped.message);
              }
            }}
          >
            {({ isSubmitting, values }) => (
              <Form noValidate className="flex max-w-sm flex-col gap-3">
                <FormError message={formError} />
                {saved ? (
                  <p role="status" className="text-sm text-pass">
                    Saved.
                  </p>
                ) : null}
                <FormikTextField name="name" label="Name" autoComplete="name" />
                <FormikSelectField
                  name="unitSystem"
                  label="Display units"
                  hint="Results are shown in these units; inputs accept any."
                >
                  <option value="si">SI (mm, kPa, MPa, kN)</option>
                  <option value="us">US customary (in, psi, lbf)</option>
                </FormikSelectField>
                <FormikSelectField
                  name="vacuumUnit"
                  label="Vacuum levels"
                  hint="Absolute pressures below 1 kPa (a chamber's base pressure, a pump-down target) are shown in this unit, whatever the display units."
                >
                  <option value="">
                    The display units’ own ({vacuumUnitOf({ system: values.unitSystem })})
                  </option>
                  {VACUUM_UNITS.map((u) => (
                    <option key={u} value={u}>
                      {u}
                    </option>
                  ))}
                </FormikSelectField>
                <div>
                  <Button type="submit" variant="primary" busy={isSubmitting}>
                    Save
                  </Button>
                </div>
              </Form>
            )}
          </Formik>
          <div className="mt-4">
            <ThemeSwitch />
          </div>
        </Panel>
        <Panel title="Password" id="password">
          <PasswordForm />
        </Panel>
        <Panel title="Memberships" id="memberships">
          {me.memberships.length === 0 ? (
            <p className="text-sm text-muted">You are not a member of any project yet.</p>
          ) : (
            <ul className="text-sm">
              {me.memberships.map((m) => (
                <li key={m.projectId}>
                  <span className="num">{m.projectNumber}</span>: {ROLE_LABEL[m.role]}
                </li>
              ))}
            </ul>
          )}
        </Panel>
      </div>
    </>
  );
}
