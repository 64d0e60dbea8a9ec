// Plain constants, safe to import in the browser (forms show the rule before submitting).
export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_LENGTH = 256;
