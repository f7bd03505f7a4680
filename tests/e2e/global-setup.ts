import type { TestProject } from "vitest/node";
import { startStack } from "./stack";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    emailUrl: string;
    paymentsUrl: string;
    dataDir: string;
  }
}

export default async function setup(project: TestProject) {
  const stack = await startStack();
  project.provide("baseUrl", stack.baseUrl);
  project.provide("emailUrl", stack.emailUrl);
  project.provide("paymentsUrl", stack.paymentsUrl);
  project.provide("dataDir", stack.dataDir);
  return stack.close;
}
