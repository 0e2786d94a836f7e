/**
 * `deferred('SignInScreen')`: a component of ./screens.tsx that is fetched the first time it is
 * rendered (React.lazy; Metro writes ./screens.tsx and all it imports as one chunk), with the same
 * props. While the chunk loads, a small neutral "Loading…" line stands in its place; once loaded,
 * every deferred component renders at once.
 */
import { lazy, Suspense, type ComponentType } from 'react';
import { Loading } from '../ui/Loading';

type Deferred = typeof import('./screens');
type Name = { [K in keyof Deferred]: Deferred[K] extends ComponentType<never> ? K : never }[keyof Deferred];

let chunk: Promise<Deferred> | undefined;
/** The deferred chunk, fetched once (also to fetch it ahead of need). */
export function loadDeferred(): Promise<Deferred> {
  chunk ??= import('./screens').catch((e: unknown) => {
    chunk = undefined; // a failed fetch is tried again on the next render
    throw e;
  });
  return chunk;
}

export function deferred<K extends Name>(name: K, placeholder: 'line' | 'none' = 'line'): Deferred[K] {
  // Typed by the caller's view (the return type); inside, any props object passes through.
  type Props = Record<string, unknown>;
  const Inner = lazy(async () => ({ default: (await loadDeferred())[name] as unknown as ComponentType<Props> }));
  function Component(props: Props) {
    return (
      <Suspense fallback={placeholder === 'line' ? <Loading label="Loading…" testID="deferred-loading" /> : null}>
        <Inner {...props} />
      </Suspense>
    );
  }
  Component.displayName = `Deferred(${name})`;
  return Component as unknown as Deferred[K];
}
