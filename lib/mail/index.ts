import "server-only";

export { mailConfig } from "./config";
export { attemptSend, ensureMailRetryLoop, mailRetryPolicy, queueMail, retryDueMail, type OutboxRow, type OutgoingMail } from "./outbox";
export { inviteMail, signInLinkMail } from "./templates";
export { appOrigin } from "./origin";
