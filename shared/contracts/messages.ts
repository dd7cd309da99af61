import { z } from 'zod';
import type { Role } from '../workflow/statuses';
import type { Moment } from './wire';

export const messageVisibilities = ['internal', 'shared'] as const;
export type MessageVisibility = (typeof messageVisibilities)[number];

/** POST /api/requests/:id/messages. Only the office may choose; without a choice its notes stay internal. */
export const postMessageInputSchema = z.strictObject({
  body: z
    .string({ error: 'Write a message.' })
    .trim()
    .min(1, 'Write a message.')
    .max(4000, 'Keep a message under 4,000 characters.'),
  visibility: z.enum(messageVisibilities, { error: 'Choose internal or shared.' }).optional(),
});
export type PostMessageInput = z.input<typeof postMessageInputSchema>;

/** One message as its reader sees it; `internal` is only sent to the office. */
export interface MessageView<When extends Moment = string> {
  id: string;
  body: string;
  createdAt: When;
  authorId: string;
  authorName: string;
  authorRole: Role;
  mine: boolean;
  internal?: boolean;
}

export interface MessagesAnswer<When extends Moment = string> {
  messages: MessageView<When>[];
}
export interface PostMessageAnswer<When extends Moment = string> {
  message: MessageView<When>;
}
