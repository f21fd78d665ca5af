// The work-order board: every open ticket by state, and moving one on by hand.
import { z } from "zod";
import { workOrderStates, workOrderSummarySchema } from "./work-orders.ts";

export const moveWorkOrderRequestSchema = z.object({
  to: z.enum(workOrderStates, { error: "Choose the state to move the work order to." }),
  /** The state the mover saw; if the ticket has moved since, the move is refused rather than guessed. */
  expectedFrom: z.enum(workOrderStates, { error: "Say which state the work order was in when you chose the move." }),
});
export type MoveWorkOrderRequest = z.infer<typeof moveWorkOrderRequestSchema>;

const who = z.object({ id: z.string(), name: z.string() }).nullable();

/** A ticket: the work order's summary without the complaint, and how long it has been in its state. */
export const boardTicketSchema = workOrderSummarySchema.pick({ id: true, number: true, state: true, customerName: true, equipmentKind: true, make: true, model: true }).extend({
  /** When the ticket entered its state, and who moved it there. */
  movedAt: z.string(),
  movedBy: who,
  secondsInState: z.number().int(),
});
export type BoardTicket = z.infer<typeof boardTicketSchema>;

export const boardColumnSchema = z.object({
  state: z.enum(workOrderStates),
  /** How many tickets are in the state; picked-up shows only the latest few of them. */
  total: z.number().int(),
  tickets: z.array(boardTicketSchema),
});

export const boardResponseSchema = z.object({ columns: z.array(boardColumnSchema), at: z.string() });
export type BoardResponse = z.infer<typeof boardResponseSchema>;

export const moveWorkOrderResponseSchema = z.object({
  id: z.string(),
  number: z.number().int(),
  from: z.enum(workOrderStates),
  state: z.enum(workOrderStates),
  movedAt: z.string(),
  movedBy: who,
});
export type MoveWorkOrderResponse = z.infer<typeof moveWorkOrderResponseSchema>;
