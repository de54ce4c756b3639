/** Stored with every solved sheet so a re-solve can tell which engine produced a number. */
export const ENGINE_VERSION = 'rungbook-thermo 1.0.0';
