import packageJson from '../package.json';

/** The version written into session files; from package.json so there is one source. */
export const TOOL_VERSION: string = packageJson.version;
