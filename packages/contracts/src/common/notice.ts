/** What a route answers when it accepted the request and has only words to say (202s, the public form). */
export interface Notice {
  readonly detail: string;
}
