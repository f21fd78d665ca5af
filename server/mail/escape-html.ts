const entities: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** Text made safe to put in an e-mail's HTML part, in an element or a quoted attribute. */
export const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => entities[c]!);
