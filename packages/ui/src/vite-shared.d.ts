export declare const defaultApiUrl: string;
export declare function apiProxy(target?: string): Record<'/api' | '/auth' | '/webhooks', { target: string }>;
export declare const sideEffectFreeSource: { test: RegExp; sideEffects: false }[];
