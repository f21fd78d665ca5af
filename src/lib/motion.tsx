import { useSyncExternalStore, type ReactNode } from "react";
import { LazyMotion, MotionConfig, m, type FeatureBundle } from "framer-motion";

let featuresFailed = false;
const listeners = new Set<() => void>();

// Animation features load after the first paint, keeping them off the bench's first load.
const loadFeatures = (): Promise<FeatureBundle> =>
  import("./motion-features.ts")
    .then((module) => module.default)
    .catch(() => {
      // Without the features content would stay at its invisible starting point, so drop the animation.
      featuresFailed = true;
      listeners.forEach((listener) => listener());
      return new Promise<FeatureBundle>(() => {});
    });

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function MotionProvider({ children }: { children: ReactNode }) {
  return (
    <LazyMotion features={loadFeatures} strict>
      <MotionConfig reducedMotion="user">{children}</MotionConfig>
    </LazyMotion>
  );
}

/** True when the animation features failed to load, so animated content must render plainly. */
export function useWithoutMotion(): boolean {
  return useSyncExternalStore(subscribe, () => featuresFailed, () => false);
}

/** A short rise into place for a page's content; with reduced motion only the fade remains. */
export function PageEnter({ children, className }: { children: ReactNode; className?: string }) {
  const withoutMotion = useWithoutMotion();
  if (withoutMotion) return <div className={className}>{children}</div>;
  return (
    <m.div
      className={className}
      initial={{ opacity: 0, y: 12 }}
      animate={{ opacity: 1, y: 0 }}
      transition={{ duration: 0.2, ease: "easeOut" }}
    >
      {children}
    </m.div>
  );
}
