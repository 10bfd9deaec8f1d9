import { describe, expect, it } from "vitest";
import { instance, renderMyCnf } from "../../scripts/db";

describe("MariaDB instance layout", () => {
  it("keeps each instance's files under .data/mariadb-<name> with its own port", () => {
    const app = instance("app", { root: "/srv/jw" });
    const test = instance("test", { root: "/srv/jw" });
    expect(app).toMatchObject({
      port: 3406,
      dataDir: "/srv/jw/.data/mariadb-app/data",
      socket: "/srv/jw/.data/mariadb-app/mariadbd.sock",
    });
    expect(test.port).toBe(3407);
    expect(instance("fault").port).toBe(3408);
  });

  it("falls back to a short socket path when the checkout is deep (Unix sockets: 107 bytes)", () => {
    const deep = `/home/${"x".repeat(90)}/jigwright`;
    const i = instance("test", { root: deep });
    expect(Buffer.byteLength(i.socket)).toBeLessThanOrEqual(107);
    expect(i.socket.startsWith("/tmp/jigwright-")).toBe(true);
    expect(instance("app", { root: deep }).socket).not.toBe(i.socket);
  });

  it("writes a config bound to loopback, utf8mb4, with its own datadir, port and socket", () => {
    const i = instance("test", { root: "/srv/jw" });
    const cnf = renderMyCnf(i);
    expect(cnf).toContain("bind-address=127.0.0.1");
    expect(cnf).toContain("port=3407");
    expect(cnf).toContain(`socket=${i.socket}`);
    expect(cnf).toContain(`datadir=${i.dataDir}`);
    expect(cnf).toContain("character-set-server=utf8mb4");
    expect(cnf.includes("user=root")).toBe(process.getuid?.() === 0);
  });

  it("refuses odd instance names", () => {
    expect(() => instance("../x")).toThrow(/Bad instance name/);
    expect(() => instance("nameless-port")).toThrow(/no default port/);
  });
});
