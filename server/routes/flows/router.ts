import { Router, type NextFunction, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { createFlow, getFlowDetail, getFlowVersion, listFlows, setRetired } from "../../services/flow-authoring.ts";
import { discardDraft, publishDraft, saveDraft, startDraft } from "../../services/flow-drafts.ts";
import { exportFlow, importFlow } from "../../services/flow-transfer.ts";
import { flowAdvice } from "../../services/flow-advice.ts";
import { draftJson, flowFileBody, parseFlowFile, smallJson } from "./body.ts";
import {
  createFlowRequestSchema,
  exportQuerySchema,
  flowParamsSchema,
  flowVersionParamsSchema,
  publishRequestSchema,
  saveDraftRequestSchema,
  startDraftRequestSchema,
  updateFlowRequestSchema,
  type FlowDetail,
} from "../../../shared/schemas/flows.ts";

type Params = z.output<typeof flowParamsSchema>;
const idOf = (res: Response) => (res.locals.params as Params).id;

/** Editing needs flow.edit; checked before a body is read. */
const editor = (_req: Request, res: Response, next: NextFunction) => {
  authorize(currentUser(res), "flow.edit");
  next();
};

/** Mounted at /api/flows; reads its own bodies (see body.ts). */
export function flowsRouter(ctx: AppContext): Router {
  const router = Router();
  const detail = (res: Response): Promise<FlowDetail> => getFlowDetail(ctx, currentUser(res), idOf(res));

  router.get("/", requireUser, async (_req: Request, res: Response) => {
    const user = currentUser(res);
    authorize(user, "flow.read");
    res.json({ flows: await listFlows(ctx, user) });
  });

  router.post("/", requireUser, editor, smallJson, validate({ body: createFlowRequestSchema }), async (req: Request, res: Response) => {
    const input = req.body as z.output<typeof createFlowRequestSchema>;
    await createFlow(ctx, currentUser(res), input);
    res.status(201).json(await getFlowDetail(ctx, currentUser(res), input.id));
  });

  router.post("/import", requireUser, editor, flowFileBody, async (req: Request, res: Response) => {
    res.status(201).json(await importFlow(ctx, currentUser(res), parseFlowFile(req)));
  });

  router.get("/:id", requireUser, validate({ params: flowParamsSchema }), async (_req: Request, res: Response) => {
    res.json(await detail(res));
  });

  router.patch("/:id", requireUser, editor, smallJson, validate({ params: flowParamsSchema, body: updateFlowRequestSchema }), async (req: Request, res: Response) => {
    await setRetired(ctx, currentUser(res), idOf(res), (req.body as z.output<typeof updateFlowRequestSchema>).retired);
    res.json(await detail(res));
  });

  router.get("/:id/versions/:number", requireUser, validate({ params: flowVersionParamsSchema }), async (_req: Request, res: Response) => {
    const { id, number } = res.locals.params as z.output<typeof flowVersionParamsSchema>;
    res.json(await getFlowVersion(ctx, currentUser(res), id, number));
  });

  router.post("/:id/draft", requireUser, editor, smallJson, validate({ params: flowParamsSchema, body: startDraftRequestSchema }), async (req: Request, res: Response) => {
    await startDraft(ctx, currentUser(res), idOf(res), (req.body as z.output<typeof startDraftRequestSchema>).fromVersion);
    res.status(201).json(await detail(res));
  });

  router.put("/:id/draft", requireUser, editor, draftJson, validate({ params: flowParamsSchema, body: saveDraftRequestSchema }), async (req: Request, res: Response) => {
    const { revision, definition } = req.body as z.output<typeof saveDraftRequestSchema>;
    res.json(await saveDraft(ctx, currentUser(res), idOf(res), revision, definition));
  });

  router.delete("/:id/draft", requireUser, editor, validate({ params: flowParamsSchema }), async (_req: Request, res: Response) => {
    await discardDraft(ctx, currentUser(res), idOf(res));
    res.status(204).end();
  });

  router.post("/:id/publish", requireUser, editor, smallJson, validate({ params: flowParamsSchema, body: publishRequestSchema }), async (req: Request, res: Response) => {
    const { revision, note } = req.body as z.output<typeof publishRequestSchema>;
    res.status(201).json(await publishDraft(ctx, currentUser(res), idOf(res), revision, note));
  });

  router.get("/:id/export", requireUser, validate({ params: flowParamsSchema, query: exportQuerySchema }), async (_req: Request, res: Response) => {
    const { version } = res.locals.query as z.output<typeof exportQuerySchema>;
    const file = await exportFlow(ctx, currentUser(res), idOf(res), version);
    res.setHeader("Content-Type", "application/json; charset=utf-8");
    res.setHeader("Content-Disposition", `attachment; filename="${file.filename}"`);
    res.setHeader("Cache-Control", "no-store");
    res.send(file.text);
  });

  router.get("/:id/advice", requireUser, validate({ params: flowParamsSchema }), async (_req: Request, res: Response) => {
    res.json(await flowAdvice(ctx, currentUser(res), idOf(res)));
  });

  return router;
}
