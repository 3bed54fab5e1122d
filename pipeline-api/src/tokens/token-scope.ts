/** What a pipeline token may do in its show (product.md: submit jobs, read takes, report render state). */
export enum TokenScope {
  JobsSubmit = 'jobs:submit',
  TakesRead = 'takes:read',
  RenderWrite = 'render:write',
}

/** Every scope, for validation and documentation. */
export const TOKEN_SCOPES: TokenScope[] = Object.values(TokenScope);
