/** Where to go after signing in: a local path only ("/assets/E-1101"), never another site ("//evil.example"). */
export function safeNextPath(value: unknown): string {
  if (typeof value !== "string" || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return "/";
  if (value.startsWith("/sign-in") || value.startsWith("/api/")) return "/";
  return value;
}
