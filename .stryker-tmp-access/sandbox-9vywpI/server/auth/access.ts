// @ts-nocheck
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import type { RequestHandler, Router } from 'express';
import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { memberships, projectRoles, type ProjectRole } from '../db/schema';
import { HttpError } from '../http-error';

/**
 * Who may call a route. Every API route declares one; `mountRoutes` puts the check in front of it, so a
 * route cannot exist without a rule, and the role-matrix test walks the same list.
 * - public: anyone; signed-in: any session; admin: organisation admins;
 * - project: a member of the route's `:projectId` holding at least `role` (admins pass as owners).
 */
export type AccessRule = {
  level: 'public';
} | {
  level: 'signed-in';
} | {
  level: 'admin';
} | {
  level: 'project';
  role: ProjectRole;
};
export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';
export interface RouteSpec {
  method: HttpMethod;
  /** Path under /api, in Express syntax. Project routes carry `:projectId`. */
  path: string;
  access: AccessRule;
  handlers: RequestHandler[];
}
declare module 'express-serve-static-core' {
  interface Request {
    /** The caller's role in the route's project, set by the access check. */
    projectRole?: ProjectRole;
    projectId?: number;
  }
}
export const access = {
  public: {
    level: 'public'
  },
  signedIn: {
    level: 'signed-in'
  },
  admin: {
    level: 'admin'
  },
  viewer: {
    level: 'project',
    role: 'viewer'
  },
  engineer: {
    level: 'project',
    role: 'engineer'
  },
  owner: {
    level: 'project',
    role: 'owner'
  }
} as const satisfies Record<string, AccessRule>;
const rank: Record<ProjectRole, number> = stryMutAct_9fa48("0") ? {} : (stryCov_9fa48("0"), {
  viewer: 1,
  engineer: 2,
  owner: 3
});
export function roleAtLeast(role: ProjectRole | undefined, needed: ProjectRole): boolean {
  if (stryMutAct_9fa48("1")) {
    {}
  } else {
    stryCov_9fa48("1");
    return stryMutAct_9fa48("4") ? role !== undefined || rank[role] >= rank[needed] : stryMutAct_9fa48("3") ? false : stryMutAct_9fa48("2") ? true : (stryCov_9fa48("2", "3", "4"), (stryMutAct_9fa48("6") ? role === undefined : stryMutAct_9fa48("5") ? true : (stryCov_9fa48("5", "6"), role !== undefined)) && (stryMutAct_9fa48("9") ? rank[role] < rank[needed] : stryMutAct_9fa48("8") ? rank[role] > rank[needed] : stryMutAct_9fa48("7") ? true : (stryCov_9fa48("7", "8", "9"), rank[role] >= rank[needed])));
  }
}
export function route(method: HttpMethod, path: string, rule: AccessRule, ...handlers: RequestHandler[]): RouteSpec {
  if (stryMutAct_9fa48("10")) {
    {}
  } else {
    stryCov_9fa48("10");
    return stryMutAct_9fa48("11") ? {} : (stryCov_9fa48("11"), {
      method,
      path,
      access: rule,
      handlers
    });
  }
}

/** The caller's role in a project, prepared once per database: every project route asks it. */
function membershipLookup(db: Db) {
  if (stryMutAct_9fa48("12")) {
    {}
  } else {
    stryCov_9fa48("12");
    const query = db.select(stryMutAct_9fa48("13") ? {} : (stryCov_9fa48("13"), {
      role: memberships.role
    })).from(memberships).where(and(eq(memberships.projectId, sql.placeholder(stryMutAct_9fa48("14") ? "" : (stryCov_9fa48("14"), 'projectId'))), eq(memberships.userId, sql.placeholder(stryMutAct_9fa48("15") ? "" : (stryCov_9fa48("15"), 'userId'))))).prepare();
    return stryMutAct_9fa48("16") ? () => undefined : (stryCov_9fa48("16"), (projectId: number, userId: number): ProjectRole | undefined => stryMutAct_9fa48("17") ? query.get({
      projectId,
      userId
    }).role : (stryCov_9fa48("17"), query.get(stryMutAct_9fa48("18") ? {} : (stryCov_9fa48("18"), {
      projectId,
      userId
    }))?.role));
  }
}
export function authorize(db: Db, rule: AccessRule, roleIn = membershipLookup(db)): RequestHandler {
  if (stryMutAct_9fa48("19")) {
    {}
  } else {
    stryCov_9fa48("19");
    return (req, _res, next) => {
      if (stryMutAct_9fa48("20")) {
        {}
      } else {
        stryCov_9fa48("20");
        if (stryMutAct_9fa48("23") ? rule.level !== 'public' : stryMutAct_9fa48("22") ? false : stryMutAct_9fa48("21") ? true : (stryCov_9fa48("21", "22", "23"), rule.level === (stryMutAct_9fa48("24") ? "" : (stryCov_9fa48("24"), 'public')))) return next();
        const user = req.user;
        if (stryMutAct_9fa48("27") ? false : stryMutAct_9fa48("26") ? true : stryMutAct_9fa48("25") ? user : (stryCov_9fa48("25", "26", "27"), !user)) throw new HttpError(401, stryMutAct_9fa48("28") ? "" : (stryCov_9fa48("28"), 'unauthenticated'), stryMutAct_9fa48("29") ? "" : (stryCov_9fa48("29"), 'Sign in to use this.'));
        if (stryMutAct_9fa48("32") ? rule.level !== 'signed-in' : stryMutAct_9fa48("31") ? false : stryMutAct_9fa48("30") ? true : (stryCov_9fa48("30", "31", "32"), rule.level === (stryMutAct_9fa48("33") ? "" : (stryCov_9fa48("33"), 'signed-in')))) return next();
        if (stryMutAct_9fa48("36") ? rule.level !== 'admin' : stryMutAct_9fa48("35") ? false : stryMutAct_9fa48("34") ? true : (stryCov_9fa48("34", "35", "36"), rule.level === (stryMutAct_9fa48("37") ? "" : (stryCov_9fa48("37"), 'admin')))) {
          if (stryMutAct_9fa48("38")) {
            {}
          } else {
            stryCov_9fa48("38");
            if (stryMutAct_9fa48("41") ? false : stryMutAct_9fa48("40") ? true : stryMutAct_9fa48("39") ? user.isAdmin : (stryCov_9fa48("39", "40", "41"), !user.isAdmin)) throw new HttpError(403, stryMutAct_9fa48("42") ? "" : (stryCov_9fa48("42"), 'forbidden'), stryMutAct_9fa48("43") ? "" : (stryCov_9fa48("43"), 'Only an organisation admin can do this.'));
            return next();
          }
        }
        const projectId = Number(req.params.projectId);
        if (stryMutAct_9fa48("46") ? !Number.isSafeInteger(projectId) && projectId <= 0 : stryMutAct_9fa48("45") ? false : stryMutAct_9fa48("44") ? true : (stryCov_9fa48("44", "45", "46"), (stryMutAct_9fa48("47") ? Number.isSafeInteger(projectId) : (stryCov_9fa48("47"), !Number.isSafeInteger(projectId))) || (stryMutAct_9fa48("50") ? projectId > 0 : stryMutAct_9fa48("49") ? projectId < 0 : stryMutAct_9fa48("48") ? false : (stryCov_9fa48("48", "49", "50"), projectId <= 0)))) {
          if (stryMutAct_9fa48("51")) {
            {}
          } else {
            stryCov_9fa48("51");
            throw new HttpError(400, stryMutAct_9fa48("52") ? "" : (stryCov_9fa48("52"), 'invalid_request'), stryMutAct_9fa48("53") ? `` : (stryCov_9fa48("53"), `projectId must be a positive whole number, not "${req.params.projectId}".`));
          }
        }
        const role: ProjectRole | undefined = user.isAdmin ? stryMutAct_9fa48("54") ? "" : (stryCov_9fa48("54"), 'owner') : roleIn(projectId, user.id);
        // A non-member learns nothing about the project, not even that it exists.
        if (stryMutAct_9fa48("57") ? false : stryMutAct_9fa48("56") ? true : stryMutAct_9fa48("55") ? role : (stryCov_9fa48("55", "56", "57"), !role)) throw new HttpError(404, stryMutAct_9fa48("58") ? "" : (stryCov_9fa48("58"), 'not_found'), stryMutAct_9fa48("59") ? `` : (stryCov_9fa48("59"), `Project ${projectId} was not found.`));
        if (stryMutAct_9fa48("62") ? false : stryMutAct_9fa48("61") ? true : stryMutAct_9fa48("60") ? roleAtLeast(role, rule.role) : (stryCov_9fa48("60", "61", "62"), !roleAtLeast(role, rule.role))) {
          if (stryMutAct_9fa48("63")) {
            {}
          } else {
            stryCov_9fa48("63");
            throw new HttpError(403, stryMutAct_9fa48("64") ? "" : (stryCov_9fa48("64"), 'forbidden'), stryMutAct_9fa48("65") ? `` : (stryCov_9fa48("65"), `This needs the ${rule.role} role or higher in this project; you are ${role}.`));
          }
        }
        req.projectRole = role;
        req.projectId = projectId;
        next();
      }
    };
  }
}
export function mountRoutes(router: Router, db: Db, specs: RouteSpec[]): void {
  if (stryMutAct_9fa48("66")) {
    {}
  } else {
    stryCov_9fa48("66");
    const roleIn = membershipLookup(db);
    for (const spec of specs) router[spec.method](spec.path, authorize(db, spec.access, roleIn), ...spec.handlers);
  }
}
export { projectRoles };