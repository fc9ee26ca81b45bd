import { HomeView } from "./home-view";

export default function HomePage() {
  return <HomeView />;
}
