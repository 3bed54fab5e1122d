// Shape of GET /api/health and a check that the answer really has it.
/** The services the API depends on, in the order the status page lists them. */
export const SERVICE_NAMES = ['db', 'redis', 's3', 'smtp'] as const;

/** Key of one backing service in the health report. */
export type ServiceName = (typeof SERVICE_NAMES)[number];

/** Health of one backing service. */
export interface ServiceHealth {
  status: 'up' | 'down';
  /** How long the check took, in milliseconds. */
  latencyMs?: number;
  /** Why the service is down, in the API's words. */
  error?: string;
}

/** The whole health report: overall state, when it was taken, and each service. */
export interface HealthReport {
  status: 'up' | 'degraded';
  /** ISO time the API ran the checks. */
  checkedAt: string;
  services: Record<ServiceName, ServiceHealth>;
}

function parseService(name: ServiceName, value: unknown): ServiceHealth {
  const service = (value ?? {}) as Record<string, unknown>;
  if (service.status !== 'up' && service.status !== 'down') {
    throw new TypeError(`The health report has no up/down status for service "${name}".`);
  }
  return {
    status: service.status,
    latencyMs: typeof service.latencyMs === 'number' ? service.latencyMs : undefined,
    error: typeof service.error === 'string' ? service.error : undefined,
  };
}

/** Checks a health answer and returns it typed; throws a TypeError naming the missing part. */
export function parseHealthReport(value: unknown): HealthReport {
  const body = (value ?? {}) as Record<string, unknown>;
  if (body.status !== 'up' && body.status !== 'degraded') {
    throw new TypeError('The health report has no overall status ("up" or "degraded").');
  }
  if (typeof body.checkedAt !== 'string') {
    throw new TypeError('The health report does not say when it was checked ("checkedAt").');
  }
  const services = (body.services ?? {}) as Record<string, unknown>;
  const parsed = {} as Record<ServiceName, ServiceHealth>;
  for (const name of SERVICE_NAMES) parsed[name] = parseService(name, services[name]);
  return { status: body.status, checkedAt: body.checkedAt, services: parsed };
}
