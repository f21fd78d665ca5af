import { FormProblem } from "../../../components/ui/form-message.tsx";

/** When a work order that had loaded can no longer be read. */
export function ScreenProblemText() {
  return (
    <FormProblem title="This work order did not load.">Check that this tablet is on the shop's network, then reload the page.</FormProblem>
  );
}
