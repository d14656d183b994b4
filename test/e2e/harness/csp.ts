// Reads the Content-Security-Policy a page declares in its <meta http-equiv>
// and says what is wrong with it for an offline site (issue 7 §5): scripts and
// styles from the site itself only, and no other host anywhere.
export type Policy = Map<string, string[]>;

export function parsePolicy(text: string): Policy {
  const policy: Policy = new Map();
  for (const part of text.split(";")) {
    const [name, ...sources] = part.trim().split(/\s+/);
    // CSP3 §2.2.1: a repeated directive is ignored, the first one wins.
    if (name && !policy.has(name.toLowerCase())) policy.set(name.toLowerCase(), sources);
  }
  return policy;
}

// Source expressions that name no host: quoted keywords, hashes and nonces,
// and the data:/blob: schemes, which carry their content with them.
const HOSTLESS = /^('[^']*'|data:|blob:)$/;

/** The sources a directive falls back to when absent (CSP3 §6.8.3, default-src fallback). */
function effective(policy: Policy, directive: string): string[] | undefined {
  return policy.get(directive) ?? policy.get("default-src");
}

export function policyProblems(text: string | null): string[] {
  if (text === null) return ['no <meta http-equiv="Content-Security-Policy"> in <head>'];
  const policy = parsePolicy(text);
  const problems: string[] = [];
  for (const directive of ["script-src", "style-src"]) {
    const sources = effective(policy, directive);
    if (!sources) problems.push(`${directive} is not restricted (neither it nor default-src is set)`);
    else if (sources.join(" ") !== "'self'")
      problems.push(`${directive} allows ${sources.join(" ")} (expected 'self' only)`);
  }
  if (!policy.has("default-src"))
    problems.push("default-src is missing (anything not listed would be allowed from any host)");
  for (const [directive, sources] of policy) {
    for (const source of sources) {
      if (/^'unsafe-/.test(source)) problems.push(`${directive} allows ${source} (expected no unsafe keyword)`);
      else if (!HOSTLESS.test(source))
        problems.push(`${directive} allows ${source} (expected no host but the site itself)`);
    }
  }
  return problems;
}

/**
 * The policy of a one-file design report (issue 20): nothing may load at all
 * (default-src 'none'), no script runs, and the only styles are the report's
 * own style block, allowed by its hash (CSP3 §8.3 hash-source).
 */
export function reportPolicyProblems(text: string | null): string[] {
  if (text === null) return ['no <meta http-equiv="Content-Security-Policy"> in <head>'];
  const policy = parsePolicy(text);
  const problems: string[] = [];
  if (policy.get("default-src")?.join(" ") !== "'none'") problems.push("default-src is not 'none'");
  const scripts = effective(policy, "script-src") ?? [];
  if (scripts.join(" ") !== "'none'") problems.push(`script-src allows ${scripts.join(" ")} (expected 'none')`);
  const styles = effective(policy, "style-src") ?? [];
  if (styles.length === 0 || !styles.every((s) => /^'sha(256|384|512)-[A-Za-z0-9+/=]+'$/.test(s)))
    problems.push(`style-src allows ${styles.join(" ")} (expected only hashes of the report's own style)`);
  for (const [directive, sources] of policy) {
    for (const source of sources) {
      if (/^'unsafe-/.test(source)) problems.push(`${directive} allows ${source} (expected no unsafe keyword)`);
      else if (!HOSTLESS.test(source)) problems.push(`${directive} allows ${source} (expected no host at all)`);
    }
  }
  return problems;
}
