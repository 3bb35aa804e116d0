// autocannon ships no types; the load benchmark uses this much of it.
declare module 'autocannon' {
  namespace autocannon {
    type Request = { method?: string; path?: string; headers?: Record<string, string>; body?: string };
    type Options = {
      url: string;
      connections: number;
      duration: number;
      timeout?: number;
      requests?: Array<Request & { setupRequest?: (request: Request) => Request }>;
    };
    type Result = { errors: number; timeouts: number; non2xx: number };
    type Instance = PromiseLike<Result> & {
      on(event: 'response', listener: (client: unknown, statusCode: number, resBytes: number, responseTimeMs: number) => void): void;
    };
  }
  function autocannon(options: autocannon.Options): autocannon.Instance;
  export default autocannon;
}
