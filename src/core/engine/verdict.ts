// Compatibility: verdict helpers live in the rule kit (src/core/rule-kit/) now.
export * from "../rule-kit/verdict.ts";
