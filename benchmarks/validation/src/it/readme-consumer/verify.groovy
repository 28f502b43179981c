// the README's consumer pom and first Java example compiled against the installed artifacts
def cls = new File(basedir, 'target/classes/com/example/guide/ReturnTube.class')
assert cls.exists()
