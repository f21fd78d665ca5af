import { useQuery } from "@tanstack/react-query";
import { Link, useParams, useSearchParams } from "react-router";
import { paperLabels, paperSizes, type PaperSize } from "../../../../shared/schemas/report.ts";
import { reportFileName } from "../../../../shared/report/customer-report.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { customerReportQueryOptions } from "../api/get-customer-report.ts";
import { paperFrom, printRules, reportPdfPath } from "../lib/paper.ts";
import { ReportSheet } from "./report-sheet.tsx";

const paperChoices = paperSizes.map((value) => ({ value, label: paperLabels[value] }));

/** The customer report of a work order, to print or to download as a PDF on A4 or Letter. */
export function CustomerReportPage() {
  const { workOrderId = "" } = useParams();
  const [search, setSearch] = useSearchParams();
  const paper = paperFrom(search);
  const { data: report, error } = useQuery(customerReportQueryOptions(workOrderId));
  const back = `/work-orders/${encodeURIComponent(workOrderId)}`;

  const choosePaper = (next: PaperSize) => {
    const params = new URLSearchParams(search);
    params.set("paper", next);
    setSearch(params, { replace: true });
  };

  return (
    <div className="customer-report flex max-w-5xl flex-col gap-6">
      <style>{printRules(paper)}</style>
      <div data-print="hide" className="flex flex-col gap-5">
        <Link to={back} className="inline-flex min-h-12 items-center self-start font-semibold text-accent underline decoration-2 underline-offset-4">
          Back to the work order
        </Link>
        {report && (
          <div className="flex flex-wrap items-end gap-x-8 gap-y-4">
            <ChoiceGroup id="report-paper" name="paper" legend="Paper" choices={paperChoices} value={paper} onChange={choosePaper} minChoiceWidth="fit" />
            <div className="flex flex-wrap items-center gap-4">
              <Button variant="primary" size="main" onClick={() => window.print()}>
                Print
              </Button>
              <a href={reportPdfPath(workOrderId, paper)} download={reportFileName(report.workOrder.number)} className={buttonClasses()}>
                Download PDF ({paperLabels[paper]})
              </a>
            </div>
          </div>
        )}
      </div>
      {report ? (
        <ReportSheet report={report} />
      ) : error ? (
        <FormProblem title={isApiRequestError(error) && error.status === 404 ? "There is no such work order." : "The report did not load."}>
          {isApiRequestError(error) && error.status === 404 ? "Go back to the work orders and open it from the list." : "Check that this tablet is on the shop's network, then reload the page."}
        </FormProblem>
      ) : (
        <p className="text-ink-muted">Putting the report together…</p>
      )}
    </div>
  );
}
