// Types for workspaces.mjs, which stays plain JavaScript so the start and test
// commands can run it before anything is installed.
export interface Workspace {
  dir: string;
  manifest: {
    name: string;
    exports?: unknown;
    dependencies?: Record<string, string>;
    devDependencies?: Record<string, string>;
    peerDependencies?: Record<string, string>;
  };
}
export interface TypecheckResult {
  dir: string;
  ok: boolean;
  output: string;
  ms: number;
}
export const codeRoots: string[];
export function listWorkspaces(): Workspace[];
export function typecheckWorkspace(dir: string): Promise<TypecheckResult>;
export function typecheckAll(opts?: { concurrency?: number; onResult?: (r: TypecheckResult) => void }): Promise<TypecheckResult[]>;
