// The invented demo scenario (brief, "Demo scenario"): the installer team Tallowmere Power Works in
// the fictional Vell Valley, a second team to show isolation, a curator, an admin and a customer.
// Addresses use the reserved .example domain; nobody here exists.
import type { Role } from "../../app/lib/roles";

export const DEMO_PASSWORD = "vell-valley-demo";

export interface DemoUser {
  name: string;
  email: string;
  role: Role;
  team?: { slug: string; membership: "owner" | "member" };
  note: string;
}

export const DEMO_TEAMS = [
  { slug: "tallowmere-power-works", name: "Tallowmere Power Works" },
  { slug: "brindlecombe-electric", name: "Brindlecombe Electric" },
];

export const DEMO_USERS: DemoUser[] = [
  {
    name: "Maren Quill",
    email: "maren@tallowmere.example",
    role: "installer",
    team: { slug: "tallowmere-power-works", membership: "owner" },
    note: "owner of Tallowmere Power Works",
  },
  {
    name: "Tobin Arkwell",
    email: "tobin@tallowmere.example",
    role: "installer",
    team: { slug: "tallowmere-power-works", membership: "member" },
    note: "installer at Tallowmere Power Works",
  },
  {
    name: "Sefa Lindqvist-Orr",
    email: "sefa@brindlecombe.example",
    role: "installer",
    team: { slug: "brindlecombe-electric", membership: "owner" },
    note: "owner of another team (for isolation)",
  },
  { name: "Ilse Varrow", email: "curator@kitwright.example", role: "curator", note: "catalogue curator" },
  { name: "Dov Pennick", email: "admin@kitwright.example", role: "admin", note: "service admin" },
  { name: "Aurel Stroud", email: "warden@vell-hut.example", role: "customer", note: "customer (the Vell Ridge mountain hut)" },
];
