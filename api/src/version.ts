/** The API's release version, reported by the health endpoint and the OpenAPI document. */
export const API_VERSION = '0.1.0';
