import { describe, expect, it } from "vitest";
import { parseAddressList } from "@/lib/classes/address-list";

describe("parseAddressList", () => {
  it("reads bare addresses and Name <address> split by commas, semicolons and lines", () => {
    const list = parseAddressList("avery@example.com, Bashir Rahimi <BASHIR@example.com>\n\"Moreau, Caitlin\" <caitlin@example.com>; dana@example.com\n\n");
    expect(list.problems).toEqual([]);
    expect(list.addresses).toEqual([
      { name: null, email: "avery@example.com" },
      { name: "Bashir Rahimi", email: "bashir@example.com" },
      { name: "Moreau, Caitlin", email: "caitlin@example.com" },
      { name: null, email: "dana@example.com" },
    ]);
  });

  it("keeps a name with an unquoted comma together", () => {
    expect(parseAddressList("Castellanos, Avery <avery@example.com>").addresses).toEqual([{ name: "Castellanos, Avery", email: "avery@example.com" }]);
  });

  it("lists the same address once and names every entry that is not an address", () => {
    const list = parseAddressList("avery@example.com\nAvery@Example.com\nnot an address\nBob <bob@>");
    expect(list.addresses).toEqual([{ name: null, email: "avery@example.com" }]);
    expect(list.problems.map((p) => p.entry)).toEqual(["not an address", "Bob <bob@>"]);
  });
});
