// the consumer's property test ran its 30 cases and passed
def report = new File(basedir, 'target/surefire-reports/com.example.chute.ChuteFloorTest.txt')
assert report.exists()
assert report.text.contains('Tests run: 30, Failures: 0, Errors: 0')
