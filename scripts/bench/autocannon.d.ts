// The part of autocannon 9's API the benchmarks use (the package ships no types).
declare module 'autocannon' {
  type Request = { method?: string; path?: string; headers?: Record<string, string>; body?: string };
  type Options = {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    method?: string;
    headers?: Record<string, string>;
    requests?: { setupRequest?: (req: Request) => Request }[];
  };
  type Result = { errors: number; timeouts: number; duration: number; non2xx: number };
  type Instance = PromiseLike<Result> & {
    on(
      event: 'response',
      fn: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void,
    ): void;
  };
  export default function autocannon(options: Options): Instance;
}
