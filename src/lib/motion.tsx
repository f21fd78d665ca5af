import type { ReactNode } from "react";
import { LazyMotion, MotionConfig, m } from "framer-motion";

// Animation features load after the first paint, keeping them off the bench's first load.
const loadFeatures = () => import("./motion-features.ts").then((module) => module.default);

export function MotionProvider({ children }: { children: ReactNode }) {
  return (
    <LazyMotion features={loadFeatures} strict>
      <MotionConfig reducedMotion="user">{children}</MotionConfig>
    </LazyMotion>
  );
}

/** A short rise into place for a page's content; with reduced motion only the fade remains. */
export function PageEnter({ children, className }: { children: ReactNode; className?: string }) {
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
