/** Version of the engine's numerical behaviour; reported in every result so stored fits can be traced. */
export const ENGINE_VERSION = '1.0.0';
