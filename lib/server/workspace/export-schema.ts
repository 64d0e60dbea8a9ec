import "server-only";

// The schema is pure and the import page checks a file with it before upload, so it lives in
// lib/shared; the server keeps this name for its callers.
export * from "@/lib/shared/validations/team-export";
