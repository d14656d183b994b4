// Compatibility: these types live in the rule kit (src/core/rule-kit/) now.
export * from "../rule-kit/types.ts";
