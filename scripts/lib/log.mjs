// Console helpers shared by the start and test scripts. Plain ESM so they run before `npm install`.
const useColor = process.stdout.isTTY && !process.env.NO_COLOR;
const paint = (code) => (text) => (useColor ? `\u001b[${code}m${text}\u001b[0m` : String(text));

export const bold = paint("1");
export const dim = paint("2");
export const red = paint("31");
export const green = paint("32");
export const yellow = paint("33");
export const cyan = paint("36");

export function info(message) {
  console.log(`${cyan("›")} ${message}`);
}

export function notice(message) {
  console.log(`${yellow("!")} ${message}`);
}

export function fail(message) {
  console.error(`${red("✗")} ${message}`);
}

export function header(title) {
  const line = "─".repeat(Math.max(8, 72 - title.length - 4));
  console.log(`\n${bold(`── ${title} ${line}`)}`);
}
