// Stored with every assessment so a result can be reproduced or compared.
export const ENGINE_VERSION = '0.2.0';
