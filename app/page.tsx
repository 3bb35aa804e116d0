export default function HomePage() {
  return (
    <section>
      <h1 className="text-2xl font-bold">Print a true-scale timing scale</h1>
      <p className="mt-2 text-steel-600 dark:text-steel-300">
        Measure the flywheel, choose a degree wheel, flange ring or rim strip, and print it at actual size.
      </p>
    </section>
  );
}
