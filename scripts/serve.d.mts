export function staleRendererSource(): string | null;
export function staleHostSource(): string | null;
