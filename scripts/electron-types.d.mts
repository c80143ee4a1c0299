export function pinnedElectronVersion(): string;
export function cachedTypesPath(version?: string): string;
export function findElectronTypes(): string | null;
export function fetchElectronTypes(): string;
