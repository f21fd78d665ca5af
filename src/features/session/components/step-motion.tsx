import type { ReactNode } from "react";
import { m } from "framer-motion";
import { useWithoutMotion } from "../../../lib/motion.tsx";

const layout = "flex flex-col gap-6";

/** Slides a new step in from the side it comes from; MotionConfig leaves only the fade under reduced motion. */
export function StepMotion({ direction, children }: { direction: 1 | -1; children: ReactNode }) {
  const withoutMotion = useWithoutMotion();
  if (withoutMotion) return <div className={layout}>{children}</div>;
  return (
    <m.div initial={{ opacity: 0, x: 48 * direction }} animate={{ opacity: 1, x: 0 }} transition={{ duration: 0.2, ease: "easeOut" }} className={layout}>
      {children}
    </m.div>
  );
}
