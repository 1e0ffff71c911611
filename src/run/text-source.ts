/**
 * Text fed chunk by chunk: the command line pushes a file's decoded chunks, the worker a Blob's.
 * Resolves when the whole text has been pushed.
 */
export type TextSource = (push: (text: string) => void) => Promise<void>;
