// algebrite ships no type declarations; the tests only use its text interface `run`.
declare module 'algebrite' {
  const Algebrite: { run(command: string): string };
  export default Algebrite;
}
