/** Version of the uncertainty engine, recorded with every stored result so a budget can be traced to the code that made it. */
export const ENGINE_VERSION = '1.1.0';
