// The retarget controls as the form holds them (text as typed), their checks with the solver's
// rules in words, and the request body: only the controls that differ from the solver's defaults.
import { CONTROLS_DEFAULTS, type Controls } from '@overshoot/solver';
import { fieldProblems } from '@/features/library/api/field-errors';
import { ApiError } from '@/lib/api-client';

/** The controls as typed in the form. */
export interface ControlValues {
  gain: string;
  stiffness: string;
  damping: string;
  prerollSeconds: string;
  physicalScaling: boolean;
  sizeExponent: string;
  clampDisplacement: boolean;
  maxDisplacement: string;
  /** Region → gain as typed. */
  regionGains: Record<string, string>;
}

/** A control of the form. */
export type ControlField = Exclude<
  keyof ControlValues,
  'regionGains' | 'physicalScaling' | 'clampDisplacement'
>;

/** Control → problem; region gains as `region:<name>`. */
export type ControlErrors = Partial<Record<ControlField | `region:${string}`, string>>;

/** The solver's defaults, every region at gain 1. */
export function defaultControlValues(regions: readonly string[]): ControlValues {
  const d = CONTROLS_DEFAULTS;
  return {
    gain: String(d.gain),
    stiffness: String(d.stiffness),
    damping: String(d.damping),
    prerollSeconds: String(d.prerollSeconds),
    physicalScaling: d.physicalScaling,
    sizeExponent: String(d.sizeExponent),
    clampDisplacement: d.maxDisplacement !== null,
    maxDisplacement: d.maxDisplacement === null ? '0.05' : String(d.maxDisplacement),
    regionGains: Object.fromEntries(regions.map((r) => [r, '1'])),
  };
}

const number = (raw: string) => (raw.trim() === '' ? NaN : Number(raw));

/** Checks the controls with the solver's rules (resolveControls); each problem in words. */
export function checkControls(v: ControlValues): ControlErrors {
  const errors: ControlErrors = {};
  if (!Number.isFinite(number(v.gain))) errors.gain = 'Enter a gain, e.g. 1 (as learned) or 1.5.';
  else if (number(v.gain) < 0)
    errors.gain = 'A negative gain turns the motion inside out; use 0 or more.';
  for (const [field, what] of [
    ['stiffness', 'Stiffness'],
    ['damping', 'Damping'],
  ] as const) {
    const n = number(v[field]);
    if (!Number.isFinite(n) || n <= 0)
      errors[field] = `${what} multiplies the learned value: enter a number above 0, e.g. 1.`;
  }
  const preroll = number(v.prerollSeconds);
  if (!Number.isFinite(preroll) || preroll < 0)
    errors.prerollSeconds = 'Enter the seconds of pre-roll, 0 or more.';
  else if (preroll > 30) errors.prerollSeconds = 'Keep the pre-roll to 30 seconds or less.';
  if (v.physicalScaling && !Number.isFinite(number(v.sizeExponent))) {
    errors.sizeExponent = 'Enter the size exponent, e.g. −0.5 (gravity) or −1 (elastic).';
  }
  if (v.clampDisplacement) {
    const max = number(v.maxDisplacement);
    if (!Number.isFinite(max) || max <= 0)
      errors.maxDisplacement = 'Enter the largest displacement in metres, above 0.';
  }
  for (const [region, raw] of Object.entries(v.regionGains)) {
    const n = number(raw);
    if (!Number.isFinite(n) || n < 0)
      errors[`region:${region}`] = `Enter a gain for ${region}, 0 or more.`;
  }
  return errors;
}

/** The controls to send: only those that differ from the solver's defaults. */
export function controlsToSend(v: ControlValues): Partial<Controls> {
  const d = CONTROLS_DEFAULTS;
  const out: Partial<Controls> = {};
  const gain = number(v.gain);
  if (gain !== d.gain) out.gain = gain;
  const stiffness = number(v.stiffness);
  if (stiffness !== d.stiffness) out.stiffness = stiffness;
  const damping = number(v.damping);
  if (damping !== d.damping) out.damping = damping;
  const preroll = number(v.prerollSeconds);
  if (preroll !== d.prerollSeconds) out.prerollSeconds = preroll;
  if (v.physicalScaling !== d.physicalScaling) out.physicalScaling = v.physicalScaling;
  if (v.physicalScaling && number(v.sizeExponent) !== d.sizeExponent)
    out.sizeExponent = number(v.sizeExponent);
  if (v.clampDisplacement) out.maxDisplacement = number(v.maxDisplacement);
  const regions = Object.entries(v.regionGains).filter(([, raw]) => number(raw) !== 1);
  if (regions.length > 0)
    out.regionGains = Object.fromEntries(regions.map(([r, raw]) => [r, number(raw)]));
  return out;
}

/** The API's refusal of the controls spread over the form's controls (`controls.gain` → gain). */
export function serverControlErrors(error: unknown): ControlErrors {
  const errors: ControlErrors = {};
  const put = (key: keyof ControlErrors, text: string) => {
    errors[key] = errors[key] ? `${errors[key]}; ${text}` : text;
  };
  for (const { field, problems } of fieldProblems(error)) {
    const text = problems.join('; ') || 'This value was not accepted.';
    const region = /^controls\.regionGains\.(.+)$/.exec(field);
    if (region) put(`region:${region[1]}`, text);
    else if (field.startsWith('controls.'))
      put(field.slice('controls.'.length) as ControlField, text);
  }
  // The solver's own refusal names the control in `details.item`.
  if (error instanceof ApiError && error.code === 'BAD_CONTROL') {
    const item = (error.details as { item?: string } | undefined)?.item ?? '';
    const region = /^regionGains\.(.+)$/.exec(item);
    if (region) put(`region:${region[1]}`, error.message);
    else if (item) put(item as ControlField, error.message);
  }
  return errors;
}
