/**
 * `deferred('SignInScreen')`: a component of ./screens.tsx that is fetched the first time it is
 * rendered (React.lazy; Metro writes ./screens.tsx and all it imports as one chunk), with the same
 * props. While the chunk loads, a small neutral "Loading…" line stands in its place (or nothing,
 * for parts that may render nothing); once loaded, every deferred component renders at once. If the
 * chunk cannot be fetched (the connection dropped), a notice says so and offers to try again.
 */
import { Component, lazy, Suspense, useState, type ComponentType, type ReactNode } from 'react';
import { Button } from '../ui/Button';
import { Loading } from '../ui/Loading';
import { Notice } from '../ui/Notice';

type Deferred = typeof import('./screens');
type Name = { [K in keyof Deferred]: Deferred[K] extends ComponentType<never> ? K : never }[keyof Deferred];

/** The chunk could not be fetched (told apart from an error of the screen itself, which goes up as before). */
class DeferredLoadError extends Error {}

let chunk: Promise<Deferred> | undefined;
/** The deferred chunk, fetched once (also to fetch it ahead of need); a failed fetch is tried again on the next call. */
export function loadDeferred(): Promise<Deferred> {
  chunk ??= import('./screens').catch((e: unknown) => {
    chunk = undefined;
    throw new DeferredLoadError(e instanceof Error ? e.message : String(e));
  });
  return chunk;
}

class LoadFailed extends Component<{ children: ReactNode; onRetry: () => void }, { error: unknown }> {
  state: { error: unknown } = { error: null };
  static getDerivedStateFromError(error: unknown) {
    return { error };
  }
  render() {
    if (this.state.error === null) return this.props.children;
    if (!(this.state.error instanceof DeferredLoadError)) throw this.state.error;
    return (
      <Notice
        tone="error"
        title="This part of the page could not be loaded."
        testID="deferred-failed"
        action={
          <Button
            variant="quiet"
            label="Try again"
            testID="deferred-retry"
            onPress={() => {
              this.setState({ error: null });
              this.props.onRetry();
            }}
          />
        }
      >
        Check the connection, then try again.
      </Notice>
    );
  }
}

export function deferred<K extends Name>(name: K, placeholder: 'line' | 'none' = 'line'): Deferred[K] {
  // Typed by the caller's view (the return type); inside, any props object passes through.
  type Props = Record<string, unknown>;
  const load = () => lazy(async () => ({ default: (await loadDeferred())[name] as unknown as ComponentType<Props> }));
  let shared = load();
  function Deferred(props: Props) {
    // React.lazy keeps a failed load: a retry makes a new one (for every later render too).
    const [Inner, setInner] = useState(() => shared);
    return (
      <LoadFailed onRetry={() => setInner(() => (shared = load()))}>
        <Suspense fallback={placeholder === 'line' ? <Loading label="Loading…" testID="deferred-loading" /> : null}>
          <Inner {...props} />
        </Suspense>
      </LoadFailed>
    );
  }
  Deferred.displayName = `Deferred(${name})`;
  return Deferred as unknown as Deferred[K];
}
