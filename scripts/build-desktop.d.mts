export function buildDesktop(): Promise<void>;
