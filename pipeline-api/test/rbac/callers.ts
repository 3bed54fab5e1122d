// The columns of the RBAC matrix: everyone who might call a route.
import { Role } from '../../src/users/entities/role';
import { TOKEN_SCOPES, type TokenScope } from '../../src/tokens/token-scope';
import type { Show } from '../../src/shows/entities/show.entity';
import { randomIp, type World } from '../support/world';

/** One caller: how to authenticate and what the expectation depends on. */
export type Caller =
  | { name: string; kind: 'anonymous'; ip: string }
  | {
      name: string;
      kind: 'user';
      role: Role;
      member: boolean;
      email: string;
      password: string;
      cookie: string;
      ip: string;
    }
  | {
      name: string;
      kind: 'token';
      scopes: TokenScope[];
      ownShow: boolean;
      secret: string;
      ip: string;
    };

const MEMBER_ROLES = [Role.TechnicalArtist, Role.Animator, Role.Supervisor, Role.Producer];

/**
 * Anonymous; the admin; each role as a member of `show`; each role as a member of another show
 * only; a token of `show` per scope; a token of the other show with every scope.
 */
export async function makeCallers(world: World, show: Show, other: Show): Promise<Caller[]> {
  const callers: Caller[] = [{ name: 'anonymous', kind: 'anonymous', ip: randomIp() }];
  const adminEmail = process.env.ADMIN_EMAIL as string;
  callers.push({
    name: 'admin',
    kind: 'user',
    role: Role.Admin,
    member: false,
    email: adminEmail,
    password: process.env.ADMIN_PASSWORD as string,
    cookie: await world.admin(),
    ip: randomIp(),
  });
  for (const role of MEMBER_ROLES) {
    const m = await world.member(role, [show]);
    callers.push({
      name: `${role} (member)`,
      kind: 'user',
      role,
      member: true,
      email: m.email,
      password: m.password,
      cookie: m.cookie,
      ip: randomIp(),
    });
  }
  for (const role of MEMBER_ROLES) {
    const m = await world.member(role, [other]);
    callers.push({
      name: `${role} (other show)`,
      kind: 'user',
      role,
      member: false,
      email: m.email,
      password: m.password,
      cookie: m.cookie,
      ip: randomIp(),
    });
  }
  for (const scope of TOKEN_SCOPES) {
    const { secret } = await world.token(show, [scope]);
    callers.push({
      name: `token ${scope}`,
      kind: 'token',
      scopes: [scope],
      ownShow: true,
      secret,
      ip: randomIp(),
    });
  }
  const { secret } = await world.token(other, TOKEN_SCOPES);
  callers.push({
    name: 'token of other show',
    kind: 'token',
    scopes: TOKEN_SCOPES,
    ownShow: false,
    secret,
    ip: randomIp(),
  });
  return callers;
}
