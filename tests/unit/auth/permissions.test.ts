import { describe, expect, it } from "vitest";
import { PERMISSIONS, can } from "@/lib/auth/permissions";
import { ROLES } from "@/lib/auth/roles";
import { navFor } from "@/lib/nav";

describe("permission table", () => {
  it("gives every role an entry", () => {
    expect(Object.keys(PERMISSIONS).sort()).toEqual([...ROLES].sort());
  });

  it("only grants athletes their own scope, except seeing their team's name", () => {
    for (const [action, scope] of Object.entries(PERMISSIONS.athlete)) {
      if (action !== "team:view") expect(scope, action).toBe("own");
    }
    expect(can("athlete", "load:view", "team")).toBe(false);
    expect(can("athlete", "load:view", "own")).toBe(true);
  });

  it("lets only the head coach manage members and thresholds", () => {
    for (const role of ROLES) {
      expect(can(role, "members:manage", "team")).toBe(role === "head_coach");
      expect(can(role, "settings:edit", "team")).toBe(role === "head_coach");
    }
  });

  it("lets exactly the roles that plan reopen a closed log (the planner's session dialog offers it to them)", () => {
    for (const role of ROLES) expect(can(role, "log:unlock", "team"), role).toBe(can(role, "plan:edit", "team"));
  });

  it("keeps physios read-only on the plan", () => {
    expect(can("physio", "plan:view", "team")).toBe(true);
    expect(can("physio", "plan:edit", "team")).toBe(false);
  });
});

describe("navigation", () => {
  it("never shows an athlete a squad screen", () => {
    const hrefs = navFor("athlete").map((n) => n.href);
    expect(hrefs).toEqual(["/home", "/me", "/me/load", "/figures"]);
    expect(navFor("athlete").find((n) => n.href === "/me/load")?.label).toBe("My load");
  });

  it("shows the head coach members and thresholds, not the athlete's own screen", () => {
    const hrefs = navFor("head_coach").map((n) => n.href);
    expect(hrefs).toContain("/members");
    expect(hrefs).toContain("/settings");
    expect(hrefs).not.toContain("/me");
    expect(hrefs).not.toContain("/me/load");
    expect(
      navFor("head_coach")
        .filter((n) => n.href === "/load")
        .map((n) => n.label),
    ).toEqual(["Squad load"]);
  });

  it("shows the physio load and alerts but not members", () => {
    const hrefs = navFor("physio").map((n) => n.href);
    expect(hrefs).toEqual(expect.arrayContaining(["/load", "/alerts", "/plan"]));
    expect(hrefs).not.toContain("/members");
  });
});
