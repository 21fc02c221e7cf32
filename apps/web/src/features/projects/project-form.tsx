import {
  ALLOWABLE_BASES,
  BAROMETERS,
  COMMON_VOCABULARY,
  designTemperatureField,
  siteSchema,
} from '@hoopline/calc';
import { Form, Formik, useFormikContext } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import type { ProjectInput } from '../../api/projects';
import {
  UNIT_SYSTEMS,
  createProjectBody,
  type DesignBasis,
  type Project,
  type SiteAsTyped,
  type UnitSystem,
} from '@hoopline/contract';
import { Button } from '../../components/button';
import {
  FormError,
  FormikSelectField,
  FormikTextAreaField,
  FormikTextField,
} from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';
import { contractText, ruleOf } from '../../lib/contract-rules';

/** The engine's site fields (units, the standard atmosphere's range). */
const SITE_FIELDS = siteSchema.shape;

export type SiteBasis = 'standard' | 'altitude' | 'ambient';

export interface ProjectFormValues {
  number: string;
  name: string;
  client: string;
  siteBasis: SiteBasis;
  altitude: string;
  ambientPressure: string;
  allowableBasis: DesignBasis['allowableStress'];
  barometer: DesignBasis['barometer'];
  /** The components' default design temperature as typed; blank: none (room temperature). */
  designTemperature: string;
  unitSystem: UnitSystem;
  notes: string;
}

const TEMPERATURE = designTemperatureField();
const TEMPERATURE_WORDS = COMMON_VOCABULARY['designTemperature']!;

export const projectSchema = yup.object({
  number: contractText(createProjectBody.shape.number, 'Project number', 'Enter a project number'),
  name: contractText(createProjectBody.shape.name, 'Project name', 'Enter a project name'),
  client: contractText(createProjectBody.shape.client, 'Client'),
  siteBasis: yup.string().oneOf(['standard', 'altitude', 'ambient']).required(),
  // The engine's site schema decides (units, the standard atmosphere's range), and its message is shown.
  altitude: yup.string().when('siteBasis', {
    is: 'altitude',
    then: (s) =>
      s
        .required('Enter the site altitude, e.g. "1500 m" or "5000 ft"')
        .test('engine', ruleOf(SITE_FIELDS.altitude, 'Site altitude')),
  }),
  ambientPressure: yup.string().when('siteBasis', {
    is: 'ambient',
    then: (s) =>
      s
        .required('Enter the ambient pressure, e.g. "95 kPa" or "13.8 psi"')
        .test('engine', ruleOf(SITE_FIELDS.ambientPressure, 'Ambient pressure')),
  }),
  allowableBasis: yup.string().oneOf(ALLOWABLE_BASES).required(),
  barometer: yup.string().oneOf(BAROMETERS).required(),
  // The engine's own design-temperature field decides, and its message is shown.
  designTemperature: yup.string().test('temperature', (text, context) => {
    if (!text || text.trim() === '') return true;
    const parsed = TEMPERATURE.safeParse(text.trim());
    return parsed.success
      ? true
      : context.createError({
          message: `Design temperature ${parsed.error.issues[0]?.message ?? 'cannot be read'}`,
        });
  }),
  unitSystem: yup.string().oneOf(UNIT_SYSTEMS).required(),
  notes: contractText(createProjectBody.shape.notes, 'Notes'),
});

export function projectFormValues(
  project: Project | undefined,
  defaultSystem: UnitSystem,
): ProjectFormValues {
  const site = (project?.siteAsTyped ?? {}) as {
    altitude?: string | number;
    ambientPressure?: string | number;
  };
  // As typed; a number is SI (a project saved before typed sites were kept).
  const typed = (value: string | number | undefined, siUnit: string) =>
    value === undefined ? '' : typeof value === 'number' ? `${value} ${siUnit}` : value;
  return {
    number: project?.number ?? '',
    name: project?.name ?? '',
    client: project?.client ?? '',
    siteBasis:
      site.altitude !== undefined
        ? 'altitude'
        : site.ambientPressure !== undefined
          ? 'ambient'
          : 'standard',
    altitude: typed(site.altitude, 'm'),
    ambientPressure: typed(site.ambientPressure, 'Pa'),
    allowableBasis: project?.designBasis?.allowableStress ?? 'asme-viii-1',
    barometer: project?.designBasis?.barometer ?? 'standard',
    designTemperature:
      project?.designTemperature == null
        ? ''
        : typeof project.designTemperature === 'number'
          ? `${project.designTemperature} K`
          : project.designTemperature,
    unitSystem: project?.unitSystem ?? defaultSystem,
    notes: project?.notes ?? '',
  };
}

/**
 * Form values → the API body: the site as typed ("5280 ft"; the API checks it
 * with the engine's site schema and keeps the text). Sea level is "no site":
 * left out on create, `null` on edit (the API's way to clear it).
 */
export function projectInput(values: ProjectFormValues): ProjectInput {
  let site: SiteAsTyped | null = null;
  if (values.siteBasis === 'altitude') site = { altitude: values.altitude.trim() };
  if (values.siteBasis === 'ambient') site = { ambientPressure: values.ambientPressure.trim() };
  return {
    number: values.number.trim(),
    name: values.name.trim(),
    client: values.client.trim(),
    site,
    designBasis: { allowableStress: values.allowableBasis, barometer: values.barometer },
    // Blank is "no default": left out on create, null (the API's way to clear it) on edit.
    designTemperature:
      values.designTemperature.trim() === '' ? null : values.designTemperature.trim(),
    unitSystem: values.unitSystem,
    notes: values.notes,
  };
}

const FIELDS = [
  'number',
  'name',
  'client',
  'altitude',
  'ambientPressure',
  'unitSystem',
  'notes',
  'siteBasis',
  'allowableBasis',
  'barometer',
  'designTemperature',
];

function SiteFields() {
  const { values } = useFormikContext<ProjectFormValues>();
  return (
    <fieldset className="grid gap-3 rounded border border-line p-3 sm:grid-cols-2">
      <legend className="px-1 text-xs font-medium">
        Site (for the ambient pressure of every load case)
      </legend>
      <FormikSelectField name="siteBasis" label="Ambient pressure from">
        <option value="standard">Standard atmosphere at sea level (101.325 kPa)</option>
        <option value="altitude">Site altitude (standard atmosphere)</option>
        <option value="ambient">A given ambient pressure</option>
      </FormikSelectField>
      {values.siteBasis === 'altitude' ? (
        <FormikTextField
          name="altitude"
          label="Site altitude"
          hint='e.g. "1500 m" or "5000 ft"'
          className="num"
        />
      ) : null}
      {values.siteBasis === 'ambient' ? (
        <FormikTextField
          name="ambientPressure"
          label="Ambient pressure (absolute)"
          hint='e.g. "95 kPa" or "13.8 psi"'
        />
      ) : null}
    </fieldset>
  );
}

/** The project's design basis: the allowable-stress basis and the barometer of every component. */
function DesignBasisFields() {
  return (
    <fieldset className="grid gap-3 rounded border border-line p-3 sm:grid-cols-2">
      <legend className="px-1 text-xs font-medium">
        Design basis (for every component of the project)
      </legend>
      <FormikSelectField
        name="allowableBasis"
        label="Allowable stress of metals"
        hint="From the specified minimum yield and tensile strengths; non-metals keep their design factor."
      >
        <option value="asme-viii-1">ASME VIII-1: lower of tensile/3.5 and 2/3 of yield</option>
        <option value="en-13445-3">EN 13445-3: lower of yield/1.5 and tensile/2.4</option>
      </FormikSelectField>
      <FormikSelectField
        name="barometer"
        label="Ambient for design"
        hint="The barometer varies some 3–5 % about the standard atmosphere."
      >
        <option value="standard">Standard atmosphere of the site</option>
        <option value="high">High barometer (105 kPa at sea level, +3.6 %)</option>
      </FormikSelectField>
      <FormikTextField
        name="designTemperature"
        label={`${TEMPERATURE_WORDS.label} (optional)`}
        hint="The default of every component that gives none, e.g. “180 degC”; blank: room temperature. A component or a load case may give its own."
        className="num"
      />
    </fieldset>
  );
}

export function ProjectForm({
  initialValues,
  submitLabel,
  onSubmit,
  onCancel,
}: {
  initialValues: ProjectFormValues;
  submitLabel: string;
  onSubmit: (input: ProjectInput) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={initialValues}
      validationSchema={projectSchema}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          await onSubmit(projectInput(values));
        } catch (error) {
          const mapped = serverFieldErrors(error, FIELDS, {
            aliases: {
              'site.altitude': 'altitude',
              'site.ambientPressure': 'ambientPressure',
              'designBasis.allowableStress': 'allowableBasis',
              'designBasis.barometer': 'barometer',
            },
          });
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex max-w-2xl flex-col gap-3">
          <FormError message={formError} />
          <div className="grid gap-3 sm:grid-cols-[10rem_1fr]">
            <FormikTextField name="number" label="Project number" required />
            <FormikTextField name="name" label="Project name" required />
          </div>
          <FormikTextField name="client" label="Client" />
          <SiteFields />
          <DesignBasisFields />
          <FormikSelectField
            name="unitSystem"
            label="Unit system"
            hint="Starting units for new components in this project."
          >
            <option value="si">SI (mm, kPa, MPa, kN)</option>
            <option value="us">US customary (in, psi, lbf)</option>
          </FormikSelectField>
          <FormikTextAreaField name="notes" label="Notes" />
          <div className="flex gap-2">
            <Button type="submit" variant="primary" busy={isSubmitting}>
              {submitLabel}
            </Button>
            {onCancel ? (
              <Button type="button" onClick={onCancel}>
                Cancel
              </Button>
            ) : null}
          </div>
        </Form>
      )}
    </Formik>
  );
}
