export interface Flash {
  kind: "success" | "info" | "error";
  message: string;
}
