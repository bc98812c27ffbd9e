export interface FakeMail {
  to: string;
  from: string;
  subject: string;
  text: string;
  receivedAt: string;
}
export interface SmtpFake {
  port: number;
  messages: FakeMail[];
  onMessage(listener: (message: FakeMail) => void): () => void;
  close(): Promise<void>;
}
export function startSmtpFake(options?: { port?: number; dir?: string }): Promise<SmtpFake>;
