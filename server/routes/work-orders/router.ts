import { Router, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { createWorkOrder, listWorkOrders } from "../../services/work-orders.ts";
import { findWorkOrder, getWorkOrderDetail } from "../../services/work-order-detail.ts";
import { savePhoto } from "../../services/attachments.ts";
import { photoUpload } from "../attachments/upload.ts";
import { getSessionDetail, startSession } from "../../services/sessions.ts";
import { createWorkOrderRequestSchema, idParamsSchema, listWorkOrdersQuerySchema, type WorkOrderListResponse } from "../../../shared/schemas/work-orders.ts";
import { createSessionRequestSchema } from "../../../shared/schemas/sessions.ts";
import { customerReport } from "../../services/customer-report.ts";
import { renderReportPdf } from "../../pdf/customer-report-pdf.tsx";
import { reportFileName } from "../../../shared/report/customer-report.ts";
import { reportPdfQuerySchema, reportQuerySchema, type ReportPdfQuery, type ReportQuery } from "../../../shared/schemas/report.ts";

type Id = z.output<typeof idParamsSchema>;

export function workOrdersRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/", requireUser, validate({ query: listWorkOrdersQuerySchema }), async (_req: Request, res: Response) => {
    authorize(currentUser(res), "work_order.read");
    const body: WorkOrderListResponse = { workOrders: await listWorkOrders(ctx, res.locals.query as z.output<typeof listWorkOrdersQuerySchema>) };
    res.json(body);
  });

  router.post("/", requireUser, validate({ body: createWorkOrderRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    authorize(user, "work_order.create");
    const id = await createWorkOrder(ctx, user, req.body as z.output<typeof createWorkOrderRequestSchema>);
    res.status(201).json(await getWorkOrderDetail(ctx, id));
  });

  router.get("/:id", requireUser, validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    authorize(currentUser(res), "work_order.read");
    res.json(await getWorkOrderDetail(ctx, (res.locals.params as Id).id));
  });

  router.post("/:id/sessions", requireUser, validate({ params: idParamsSchema, body: createSessionRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    authorize(user, "session.create");
    const { flowId } = req.body as z.output<typeof createSessionRequestSchema>;
    const id = await startSession(ctx, user, (res.locals.params as Id).id, flowId);
    res.status(201).json(await getSessionDetail(ctx, user, id));
  });

  // The work order is checked before the upload is read, so a refused caller sends no bytes anywhere.
  const intakePhotoTarget = async (_req: Request, res: Response, next: () => void) => {
    authorize(currentUser(res), "work_order.update");
    await findWorkOrder(ctx, (res.locals.params as Id).id);
    next();
  };
  router.post("/:id/intake-photo", requireUser, validate({ params: idParamsSchema }), intakePhotoTarget, photoUpload, async (req: Request, res: Response) => {
    const owner = { type: "work_order" as const, id: (res.locals.params as Id).id, stepId: null };
    const { created: _created, ...photo } = await savePhoto(ctx, currentUser(res), owner, req.file!.buffer);
    res.status(201).json(photo);
  });

  router.get("/:id/report", requireUser, validate({ params: idParamsSchema, query: reportQuerySchema }), async (_req: Request, res: Response) => {
    authorize(currentUser(res), "work_order.read");
    const { estimateId } = res.locals.query as ReportQuery;
    res.json(await customerReport(ctx, (res.locals.params as Id).id, estimateId));
  });

  router.get("/:id/report.pdf", requireUser, validate({ params: idParamsSchema, query: reportPdfQuerySchema }), async (_req: Request, res: Response) => {
    authorize(currentUser(res), "work_order.read");
    const { estimateId, paper } = res.locals.query as ReportPdfQuery;
    const report = await customerReport(ctx, (res.locals.params as Id).id, estimateId);
    const pdf = await renderReportPdf(report, paper);
    res.set({ "Content-Type": "application/pdf", "Content-Disposition": `inline; filename="${reportFileName(report.workOrder.number)}"`, "Cache-Control": "no-store" });
    res.send(pdf);
  });

  return router;
}
